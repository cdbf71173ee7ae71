import { createSecretKey } from 'node:crypto'
import type { NextFunction, Request, Response } from 'express'
import { Passport } from 'passport'
import { Strategy as JwtStrategy } from 'passport-jwt'
import type { Role } from '../../shared/schemas/auth'

export const SESSION_COOKIE = 'qn_session'

/** The signed-in user as every route sees it, re-read from the database on each request. */
export interface AuthUser {
  id: number
  email: string
  name: string
  role: Role
  companyId: number | null
  companyName: string | null
}

/** The user of a session, or null when the account is inactive or the session was ended. */
export type LoadUser = (id: number, tokenVersion: number) => Promise<AuthUser | null>

/**
 * Reads the session token from its HttpOnly cookie and attaches the user when the token is
 * valid and the account still active; a missing or bad token leaves the request anonymous, so
 * each route's access rule decides between 401 and going on.
 */
export function authenticate(secret: string, loadUser: LoadUser) {
  const passport = new Passport()
  passport.use(
    new JwtStrategy(
      {
        jwtFromRequest: (req: Request) =>
          (req.cookies?.[SESSION_COOKIE] as string | undefined) ?? null,
        // A key object made once: handed the string, jsonwebtoken would first try (and fail) to
        // read it as a public key on every request, which costs more than the whole HMAC check.
        secretOrKey: createSecretKey(Buffer.from(secret)) as unknown as Buffer,
        algorithms: ['HS256'],
        issuer: 'quellnode',
      },
      (
        payload: { sub?: string; ver?: unknown },
        done: (e: unknown, u?: AuthUser | false) => void,
      ) => {
        const id = Number(payload.sub)
        if (!Number.isInteger(id) || !Number.isInteger(payload.ver)) return done(null, false)
        loadUser(id, payload.ver as number).then((u) => done(null, u ?? false), done)
      },
    ),
  )
  return (req: Request, res: Response, next: NextFunction) => {
    if (!req.cookies?.[SESSION_COOKIE]) return next()
    passport.authenticate('jwt', { session: false }, (err: unknown, user: AuthUser | false) => {
      if (err) return next(err)
      if (user) req.user = user
      next()
    })(req, res, next)
  }
}
