import type { Request, RequestHandler, Response } from 'express'
import type { AuthUser } from '../middleware/authenticate'
import type { ZodType } from 'zod'
import type { Role } from '../../shared/schemas/auth'
import type { JsonText } from './json-text'

/**
 * What a handler may return for a JSON answer of type T: a Date where T has a string, since
 * the JSON of a Date is its ISO string; a stored JSON text of a field's type (json-text.ts).
 */
export type Wire<T> = T extends string
  ? T | Date
  : T extends readonly (infer U)[]
    ? Wire<U>[] | JsonText<T>
    : T extends object
      ? { [K in keyof T]: Wire<T[K]> } | JsonText<T>
      : T

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete'

/** Who may call a route: a list of roles, any signed-in user, or anyone. */
export type Access = readonly Role[] | 'signed-in' | 'public'

/** What a route declares besides where it is (method, path, tag) and who may call it. */
export interface RouteDetails<B, Q, P, R = unknown> {
  summary: string
  body?: ZodType<B>
  query?: ZodType<Q>
  params?: ZodType<P>
  /**
   * The JSON answer, from shared/schemas: the API document shows it and the API tests check
   * every answer against it. A route that answers with no body (204, 202) or with a file
   * (`produces`) has none.
   */
  response?: ZodType<R>
  status?: number
  /** Content type of a non-JSON answer (a PDF, say), for the API document. */
  produces?: string
  /** A multipart upload: the file field's name, for the API document; `before` parses it. */
  upload?: string
  /** Middleware run after the access check and before validation (an upload parser, say). */
  before?: RequestHandler[]
}

export interface RouteSpec<B, Q, P, R = unknown> extends RouteDetails<B, Q, P, R> {
  method: Method
  path: string
  tag: string
  access: Access
}

export interface RouteInput<B, Q, P> {
  body: B
  query: Q
  params: P
  user: AuthUser
  req: Request
  res: Response
}

/** Answers a route: the JSON answer, or undefined when it wrote the response itself. */
export type RouteHandler<B, Q, P, R> = (
  input: RouteInput<B, Q, P>,
) => Wire<NoInfer<R>> | undefined | Promise<Wire<NoInfer<R>> | undefined>
