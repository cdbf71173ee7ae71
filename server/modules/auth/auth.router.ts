import { NoticeSchema, SessionSchema } from '../../../shared/schemas/auth'
import { Router, type Response } from 'express'
import { ResetRequestSchema, SetPasswordSchema, SignInSchema } from '../../../shared/schemas/auth'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import { clientAddress } from '../../http/client-address'
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
  opts: { tokenTtlHours: number; secureCookie: boolean },
) {
  const router = Router()
  const tag = 'Sign-in'
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/auth/sign-in',
      response: SessionSchema,
      tag,
      summary: 'Sign in; sets the session cookie',
      access: 'public',
      body: SignInSchema,
    },
    async ({ body, req, res }) => {
      const { user, token } = await auth.signIn(body.email, body.password, clientAddress(req))
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
    async ({ user, res }) => {
      if (user) await auth.endSessions(user.id)
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
      response: SessionSchema,
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
      response: NoticeSchema,
      tag,
      summary: 'Mail a password reset link',
      access: 'public',
      body: ResetRequestSchema,
      status: 202,
    },
    async ({ body, req, res }) => {
      await auth.admitReset(body.email, clientAddress(req))
      // The lookup, the link and the mail happen after the answer has left, so a known and an
      // unknown address answer in the same time.
      res.on('finish', () => {
        auth.requestReset(body.email).catch((err: unknown) => req.log?.error({ err }, 'reset'))
      })
      return { message: 'If the address has an account, a link is on its way.' }
    },
  )
  return router
}
