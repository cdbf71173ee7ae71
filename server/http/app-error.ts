/**
 * The one error type a service throws for a failure the client should see. `code` is stable
 * kebab-case (`quote-not-found`); `details` names the fields at fault.
 */
export class AppError extends Error {
  constructor(
    readonly code: string,
    message: string,
    readonly status = 400,
    readonly details?: unknown,
  ) {
    super(message)
    this.name = 'AppError'
  }
}

export const notFound = (what: string, code = `${what}-not-found`) =>
  new AppError(code, `The ${what.replace(/-/g, ' ')} does not exist or is not yours to see.`, 404)

/**
 * The record, or null when it does not exist (a 404 from its service). Any other failure, a
 * database outage above all, still reaches the client as what it is, never as "not found".
 */
export function nullIfMissing<T>(read: Promise<T>): Promise<T | null> {
  return read.catch((err: unknown) => {
    if (err instanceof AppError && err.status === 404) return null
    throw err
  })
}

export const forbidden = (message = 'Your role may not do this.') =>
  new AppError('forbidden', message, 403)
