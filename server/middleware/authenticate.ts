import { createSecretKey } from 'node:crypto'
import type { NextFunction, Request, Response } from 'express'
import { Passport } from 'passport'
import { Strategy as JwtStrategy } from 'passport-jwt'
import type { Role } from '../../shared/schemas/auth'
import { verifiedTokens } from './verified-tokens'

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
 * each route's access rule decides between 401 and going on. A token that passed passport-jwt's
 * check before skips it until it expires (verified-tokens.ts); the session itself (`loadUser`)
 * is asked about on every request.
 */
export function authenticate(secret: string, loadUser: LoadUser) {
  const checked = verifiedTokens()
  const passport = new Passport()
  passport.use(
    new JwtStrategy(
      {
        jwtFromRequest: tokenOf,
        passReqToCallback: true,
        // A key object made once: handed the string, jsonwebtoken would first try (and fail) to
        // read it as a public key on every request, which costs more than the whole HMAC check.
        secretOrKey: createSecretKey(Buffer.from(secret)) as unknown as Buffer,
        algorithms: ['HS256'],
        issuer: 'quellnode',
      },
      (
        req: Request,
        payload: { sub?: string; ver?: unknown; exp?: unknown },
        done: (e: unknown, u?: AuthUser | false) => void,
      ) => {
        const id = Number(payload.sub)
        const version = payload.ver
        if (!Number.isInteger(id) || !Number.isInteger(version)) return done(null, false)
        checked.add(tokenOf(req) as string, { id, version: version as number }, payload.exp)
        loadUser(id, version as number).then((u) => done(null, u ?? false), done)
      },
    ),
  )
  return (req: Request, res: Response, next: NextFunction) => {
    const token = tokenOf(req)
    if (!token) return next()
    const attach = (err: unknown, user: AuthUser | false | null) => {
      if (err) return next(err)
      if (user) req.user = user
      next()
    }
    const known = checked.get(token)
    if (known)
      loadUser(known.id, known.version).then(
        (u) => attach(null, u),
        (e: unknown) => attach(e, null),
      )
    else passport.authenticate('jwt', { session: false }, attach)(req, res, next)
  }
}

function tokenOf(req: Request): string | null {
  return (req.cookies?.[SESSION_COOKIE] as string | undefined) || null
}
