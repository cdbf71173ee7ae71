import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router'
import type { Role } from '@shared/schemas/auth'
import { useAuthStore } from '@/stores/auth'

export type RouteName =
  'home' | 'sign-in' | 'set-password' | 'forgot-password' | 'admin-users' | 'not-found'

declare module 'vue-router' {
  interface RouteMeta {
    /** Roles that may open the view; absent means anyone, signed in or not. */
    roles?: readonly Role[]
    title?: string
  }
}

const ALL: readonly Role[] = ['engineer', 'sales', 'customer', 'production', 'admin']

const routes: (RouteRecordRaw & { name: RouteName })[] = [
  {
    path: '/',
    name: 'home',
    component: () => import('@/views/HomeView.vue'),
    meta: { roles: ALL, title: 'Overview' },
  },
  {
    path: '/sign-in',
    name: 'sign-in',
    component: () => import('@/views/SignInView.vue'),
    meta: { title: 'Sign in' },
  },
  {
    path: '/set-password',
    name: 'set-password',
    component: () => import('@/views/SetPasswordView.vue'),
    meta: { title: 'Set password' },
  },
  {
    path: '/forgot-password',
    name: 'forgot-password',
    component: () => import('@/views/ForgotPasswordView.vue'),
    meta: { title: 'Forgot password' },
  },
  {
    path: '/admin/users',
    name: 'admin-users',
    component: () => import('@/views/AdminUsersView.vue'),
    meta: { roles: ['admin'], title: 'Users' },
  },
  {
    path: '/:rest(.*)*',
    name: 'not-found',
    component: () => import('@/views/NotFoundView.vue'),
    meta: { title: 'Not found' },
  },
]

export const router = createRouter({ history: createWebHistory(), routes })

/** A typed push: only route names that exist compile. */
export function go(
  name: RouteName,
  params?: Record<string, string | number>,
  query?: Record<string, string>,
) {
  return router.push({ name, params, query })
}

// A convenience for the person at the screen; the server checks every request itself.
router.beforeEach(async (to) => {
  const auth = useAuthStore()
  await auth.restore()
  const roles = to.meta.roles
  if (!roles) return true
  if (!auth.user) return { name: 'sign-in', query: { next: to.fullPath } }
  if (!roles.includes(auth.user.role))
    return { name: 'not-found', params: { rest: to.path.slice(1).split('/') } }
  return true
})

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Quellnode` : 'Quellnode'
})
