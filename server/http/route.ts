import type { Request, RequestHandler, Response, Router } from 'express'
import type { ZodType } from 'zod'
import { z } from 'zod'
import { AppError } from './app-error'
import { answerJson } from './json-text'
import { discardUpload } from './upload'
import { OUT_OF_RANGE } from '../../shared/schemas/model'
import type { AuthUser } from '../middleware/authenticate'
import type { ApiRegistry } from './api-registry'
import type { Access, Method, RouteHandler, RouteSpec } from './route-spec'

export type { Access, RouteInput, RouteSpec } from './route-spec'

/** Field paths and messages of a failed parse, as the 400 answer lists them. */
export function issuesOf(error: z.ZodError, where: string) {
  return error.issues.map((i) => ({
    path: [where, ...i.path.map(String)].join('.'),
    message: i.message,
  }))
}

function parsePart<T>(schema: ZodType<T> | undefined, value: unknown, where: string): T {
  if (!schema) return undefined as T
  const result = schema.safeParse(value ?? {})
  if (result.success) return result.data
  const details = issuesOf(result.error, where)
  const first = details[0]
  const message = first ? `${first.path}: ${first.message}` : `Invalid ${where}`
  // Well-formed values outside a documented range (the engine's) cannot be processed: 422.
  const outOfRange = result.error.issues.every(
    (i) => i.code === 'custom' && (i.params as typeof OUT_OF_RANGE | undefined)?.unprocessable,
  )
  if (outOfRange) throw new AppError('out-of-range', message, 422, details)
  throw new AppError('invalid-input', message, 400, details)
}

/**
 * A body must come in the type the route reads: JSON, or multipart for an upload. An HTML form
 * on another site can only send form or plain-text bodies without a preflight, so this also
 * shuts the classic cross-site form post out of every JSON route.
 */
function checkContentType(spec: { method: Method; upload?: string }, req: Request) {
  if (spec.method === 'get') return
  const expected = spec.upload ? 'multipart/form-data' : 'application/json'
  const length = Number(req.get('content-length') ?? 0)
  const hasBody =
    req.get('content-type') !== undefined || length > 0 || req.get('transfer-encoding')
  if (hasBody && !req.is(expected))
    throw new AppError('unsupported-media-type', `Send the request body as ${expected}.`, 415)
}

function checkAccess(access: Access, user: AuthUser | undefined): AuthUser {
  if (access === 'public') return user as AuthUser
  if (!user) throw new AppError('not-signed-in', 'Sign in to continue.', 401)
  if (access !== 'signed-in' && !access.includes(user.role)) {
    throw new AppError('forbidden', 'Your role may not do this.', 403)
  }
  return user
}

/**
 * In the API tests (ApiRegistry.checkResponses): an answer outside the route's response schema
 * is a 500 naming the route and the fields, so a test that sees it fails.
 */
function checkResponse(spec: RouteSpec<unknown, unknown, unknown>, result: unknown) {
  const where = `${spec.method.toUpperCase()} ${spec.path}`
  if (!spec.response)
    throw new AppError('response-contract', `${where} answers JSON but declares no schema`, 500)
  // What the client receives: dates as strings, undefined fields gone.
  const parsed = spec.response.safeParse(JSON.parse(answerJson(result)))
  if (parsed.success) return
  const details = issuesOf(parsed.error, 'response')
  const first = details[0]
  throw new AppError(
    'response-contract',
    `${where} answered outside its schema${first ? `: ${first.path}: ${first.message}` : ''}`,
    500,
    details,
  )
}

/**
 * Declares one route: access check, validation of params, query and body against the shared
 * schemas, and an entry in the API document. The handler returns the JSON answer (whose
 * objects may hold stored JSON texts, placed as they are: json-text.ts), or undefined when it
 * wrote the response itself.
 */
export function route<B = undefined, Q = undefined, P = undefined, R = unknown>(
  router: Router,
  registry: ApiRegistry,
  spec: RouteSpec<B, Q, P, R>,
  handler: RouteHandler<B, Q, P, R>,
): void {
  registry.add(spec)
  const guard: RequestHandler = (req, _res, next) => {
    checkAccess(spec.access, req.user as AuthUser | undefined)
    checkContentType(spec, req)
    next()
  }
  router[spec.method](
    spec.path,
    guard,
    ...(spec.before ?? []),
    async (req: Request, res: Response) => {
      const user = req.user as AuthUser
      let parts
      try {
        parts = {
          params: parsePart(spec.params, req.params, 'params'),
          query: parsePart(spec.query, req.query, 'query'),
          body: parsePart(spec.body, req.body, 'body'),
        }
      } catch (e) {
        // A request refused for its fields leaves no upload behind, removed before the answer
        // goes out. Past this point the service owns the file: it removes it on a refusal and
        // keeps it once a stored row names it, even when a later step fails.
        await discardUpload(req.file)
        throw e
      }
      const result = await handler({ ...parts, user, req, res })
      if (res.headersSent) return
      if (result === undefined) res.status(spec.status ?? 204).end()
      else {
        if (registry.checkResponses)
          checkResponse(spec as RouteSpec<unknown, unknown, unknown>, result)
        res
          .status(spec.status ?? 200)
          .type('json')
          .send(answerJson(result))
      }
    },
  )
}
