import { Router } from 'express'
import type { ApiRegistry } from './api-registry'
import { route } from './route'
import type { Access, Method, RouteDetails, RouteHandler } from './route-spec'

/** Who reads (GET) and who changes (every other method) a resource, as shared/access.ts lists. */
export interface TableAccess {
  read?: Access
  write?: Access
}

/**
 * One route of a table: its details, an access of its own only where the table's does not fit,
 * and the answer: the handler, which returns the JSON answer or undefined when it wrote the
 * response itself. The method, the path and the tag come from the table and the call.
 */
export interface TableRoute<B, Q, P, R> extends RouteDetails<B, Q, P, R> {
  access?: Access
  answer: RouteHandler<B, Q, P, R>
}

type Declare = <B = undefined, Q = undefined, P = undefined, R = unknown>(
  path: string,
  route: TableRoute<B, Q, P, R>,
) => void

/**
 * The routes of one resource under one tag of the API document, declared by method:
 * `routes.get('/api/models/:id', { summary, response, params, answer })` is a `route()` whose
 * access is the table's read access (a GET) or its write access (any other method), unless the
 * route names its own. `router` is the Express router they are mounted on.
 */
export function routeTable(
  registry: ApiRegistry,
  tag: string,
  access: TableAccess,
  router: Router = Router(),
) {
  const declare =
    (method: Method): Declare =>
    (path, { answer, access: own, ...spec }) => {
      const who = own ?? (method === 'get' ? access.read : access.write)
      if (!who) throw new Error(`${method.toUpperCase()} ${path} declares no access`)
      route(router, registry, { ...spec, tag, method, path, access: who }, answer)
    }
  return {
    router,
    get: declare('get'),
    post: declare('post'),
    put: declare('put'),
    patch: declare('patch'),
    delete: declare('delete'),
  }
}

export type RouteTable = ReturnType<typeof routeTable>
