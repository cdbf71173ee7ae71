import { NoticeSchema, SessionSchema } from '../../../shared/schemas/auth'
import type { Response } from 'express'
import { ResetRequestSchema, SetPasswordSchema, SignInSchema } from '../../../shared/schemas/auth'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
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
  const routes = routeTable(api, 'Sign-in', {})
  routes.post('/api/auth/sign-in', {
    summary: 'Sign in; sets the session cookie',
    response: SessionSchema,
    access: 'public',
    body: SignInSchema,
    answer: async ({ body, req, res }) => {
      const { user, token } = await auth.signIn(body.email, body.password, clientAddress(req))
      setSession(res, token, opts.tokenTtlHours, opts.secureCookie)
      return { user }
    },
  })
  routes.post('/api/auth/sign-out', {
    summary: 'Sign out; clears the session cookie',
    access: 'public',
    answer: async ({ user, res }) => {
      if (user) await auth.endSessions(user.id)
      res.clearCookie(SESSION_COOKIE, { path: '/' })
      return undefined
    },
  })
  routes.get('/api/auth/me', {
    summary: 'The signed-in user',
    response: SessionSchema,
    access: 'signed-in',
    answer: ({ user }) => ({ user }),
  })
  routes.post('/api/auth/password', {
    summary: 'Set a password with an invitation or reset link',
    access: 'public',
    body: SetPasswordSchema,
    answer: async ({ body }) => {
      await auth.setPassword(body.token, body.password)
      return undefined
    },
  })
  routes.post('/api/auth/reset', {
    summary: 'Mail a password reset link',
    response: NoticeSchema,
    access: 'public',
    body: ResetRequestSchema,
    status: 202,
    answer: async ({ body, req, res }) => {
      await auth.admitReset(body.email, clientAddress(req))
      // The lookup, the link and the mail happen after the answer has left, so a known and an
      // unknown address answer in the same time.
      res.on('finish', () => {
        auth.requestReset(body.email).catch((err: unknown) => req.log?.error({ err }, 'reset'))
      })
      return { message: 'If the address has an account, a link is on its way.' }
    },
  })
  return routes.router
}
