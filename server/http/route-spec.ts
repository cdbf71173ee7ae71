import type { RequestHandler } from 'express'
import type { ZodType } from 'zod'
import type { Role } from '../../shared/schemas/auth'

/**
 * What a handler may return for a JSON answer of type T: a Date where T has a string, since
 * the JSON of a Date is its ISO string.
 */
export type Wire<T> = T extends string
  ? T | Date
  : T extends readonly (infer U)[]
    ? Wire<U>[]
    : T extends object
      ? { [K in keyof T]: Wire<T[K]> }
      : T

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete'

/** Who may call a route: a list of roles, any signed-in user, or anyone. */
export type Access = readonly Role[] | 'signed-in' | 'public'

export interface RouteSpec<B, Q, P, R = unknown> {
  method: Method
  path: string
  summary: string
  tag: string
  access: Access
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
