import { Router, type Response } from 'express'
import { rateLimit } from 'express-rate-limit'
import { ResetRequestSchema, SetPasswordSchema, SignInSchema } from '../../../shared/schemas/auth'
import type { ApiRegistry } from '../../http/api-registry'
import { AppError } from '../../http/app-error'
import { route } from '../../http/route'
import { SESSION_COOKIE } from '../../middleware/authenticate'
import type { AuthService } from './auth.service'

function setSession(res: Response, token: string, hours: number, secure: boolean) {
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'strict',
    secure,
    path: '/',
    maxAge: hours * 3600_000,
  })
}

export function authRouter(
  api: ApiRegistry,
  auth: AuthService,
  opts: { tokenTtlHours: number; secureCookie: boolean; signInLimit: number },
) {
  const router = Router()
  // Counts failed attempts only, per client address; the sixth within the window gets 429.
  router.use(
    '/api/auth/sign-in',
    rateLimit({
      windowMs: 15 * 60_000,
      limit: opts.signInLimit,
      skipSuccessfulRequests: true,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: (_req, _res, next) =>
        next(
          new AppError('too-many-attempts', 'Too many failed sign-ins; wait a few minutes.', 429),
        ),
    }),
  )
  const tag = 'Sign-in'
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/auth/sign-in',
      tag,
      summary: 'Sign in; sets the session cookie',
      access: 'public',
      body: SignInSchema,
    },
    async ({ body, res }) => {
      const { user, token } = await auth.signIn(body.email, body.password)
      setSession(res, token, opts.tokenTtlHours, opts.secureCookie)
      return { user }
    },
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/auth/sign-out',
      tag,
      summary: 'Sign out; clears the session cookie',
      access: 'public',
    },
    ({ res }) => {
      res.clearCookie(SESSION_COOKIE, { path: '/' })
      return undefined
    },
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/auth/me',
      tag,
      summary: 'The signed-in user',
      access: 'signed-in',
    },
    ({ user }) => ({ user }),
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/auth/password',
      tag,
      summary: 'Set a password with an invitation or reset link',
      access: 'public',
      body: SetPasswordSchema,
    },
    async ({ body }) => {
      await auth.setPassword(body.token, body.password)
      return undefined
    },
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/auth/reset',
      tag,
      summary: 'Mail a password reset link',
      access: 'public',
      body: ResetRequestSchema,
      status: 202,
    },
    async ({ body }) => {
      await auth.requestReset(body.email)
      return { message: 'If the address has an account, a link is on its way.' }
    },
  )
  return router
}
