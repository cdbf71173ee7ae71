import type { Notice, Session, SignIn } from '@shared/schemas/auth'
import { api } from './client'

export const authApi = {
  me: () => api.get<Session>('/api/auth/me'),
  signIn: (body: SignIn) => api.post<Session>('/api/auth/sign-in', body),
  signOut: () => api.post<void>('/api/auth/sign-out'),
  setPassword: (token: string, password: string) =>
    api.post<void>('/api/auth/password', { token, password }),
  requestReset: (email: string) => api.post<Notice>('/api/auth/reset', { email }),
}
