import { createRouter, createWebHistory, type RouteRecordRaw } from 'vue-router'
import { isPublicPage, mayOpen, type PageName, type PublicPage } from '@shared/access'
import { useAuthStore } from '@/stores/auth'
import { STEP_PATTERN } from '@/features/sizing/steps'

/** Every page's name: behind sign-in (roles in `shared/access.ts`) or public. */
export type RouteName = PageName | PublicPage

declare module 'vue-router' {
  interface RouteMeta {
    title?: string
  }
}

const routes: (RouteRecordRaw & { name: RouteName })[] = [
  {
    path: '/',
    name: 'home',
    component: () => import('@/views/HomeView.vue'),
    meta: { title: 'Overview' },
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
    meta: { title: 'Users' },
  },
  {
    path: '/admin/refunds',
    name: 'admin-refunds',
    component: () => import('@/views/PaymentRefundsView.vue'),
    meta: { title: 'Second payments' },
  },
  {
    path: '/admin/tax',
    name: 'admin-tax',
    component: () => import('@/views/AdminTaxView.vue'),
    meta: { title: 'Tax rates' },
  },
  {
    path: '/admin/audit',
    name: 'admin-audit',
    component: () => import('@/views/AdminAuditView.vue'),
    meta: { title: 'Audit trail' },
  },
  {
    path: '/portal',
    name: 'portal',
    component: () => import('@/views/PortalView.vue'),
    meta: { title: 'Your quotes' },
  },
  {
    path: '/portal/quotes/:id',
    name: 'portal-quote',
    component: () => import('@/views/PortalQuoteView.vue'),
    meta: { title: 'Quote' },
  },
  {
    path: '/portal/payment/done',
    name: 'portal-payment-done',
    component: () => import('@/views/PaymentDoneView.vue'),
    meta: { title: 'Payment' },
  },
  {
    path: '/sites',
    name: 'sites',
    component: () => import('@/views/SitesView.vue'),
    meta: { title: 'Sites' },
  },
  {
    path: '/sites/:id(\\d+)',
    name: 'site',
    component: () => import('@/views/SiteView.vue'),
    props: true,
    meta: { title: 'Site' },
  },
  {
    path: '/sites/:id(\\d+)/records',
    name: 'site-records',
    component: () => import('@/views/SiteRecordsView.vue'),
    props: true,
    meta: { title: 'Measurements' },
  },
  {
    path: '/sizings',
    name: 'sizings',
    component: () => import('@/features/sizing/SizingsView.vue'),
    meta: { title: 'Sizings' },
  },
  {
    path: `/sizings/new/${STEP_PATTERN}`,
    name: 'sizing-new',
    component: () => import('@/features/sizing/SizingWorkspaceView.vue'),
    props: true,
    meta: { title: 'New sizing' },
  },
  {
    path: `/sizings/:id(\\d+)/${STEP_PATTERN}`,
    name: 'sizing',
    component: () => import('@/features/sizing/SizingWorkspaceView.vue'),
    props: true,
    meta: { title: 'Sizing' },
  },
  {
    path: '/work-orders',
    name: 'work-orders',
    component: () => import('@/views/WorkOrdersView.vue'),
    meta: { title: 'Work orders' },
  },
  {
    path: '/work-orders/:id',
    name: 'work-order',
    component: () => import('@/views/WorkOrderView.vue'),
    meta: { title: 'Work order' },
  },
  {
    path: '/quotes',
    name: 'quotes',
    component: () => import('@/views/QuoteListView.vue'),
    meta: { title: 'Quotes' },
  },
  {
    path: '/quotes/new',
    name: 'quote-new',
    component: () => import('@/views/QuoteBuilderView.vue'),
    meta: { title: 'New quote' },
  },
  {
    path: '/quotes/:id(\\d+)',
    name: 'quote',
    component: () => import('@/views/QuoteDetailView.vue'),
    meta: { title: 'Quote' },
  },
  {
    path: '/quotes/:id(\\d+)/edit',
    name: 'quote-edit',
    component: () => import('@/views/QuoteBuilderView.vue'),
    meta: { title: 'Change quote' },
  },
  {
    path: '/admin/catalogue',
    name: 'catalogue',
    component: () => import('@/views/CatalogueListView.vue'),
    meta: { title: 'Catalogue' },
  },
  {
    path: '/customers',
    name: 'customers',
    component: () => import('@/views/CustomerListView.vue'),
    meta: { title: 'Customers' },
  },
  {
    path: '/customers/:id(\\d+)',
    name: 'customer',
    component: () => import('@/views/CustomerDetailView.vue'),
    meta: { title: 'Customer' },
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
  if (typeof to.name === 'string' && isPublicPage(to.name)) return true
  if (!auth.user) return { name: 'sign-in', query: { next: to.fullPath } }
  if (!mayOpen(auth.user.role, String(to.name)))
    return { name: 'not-found', params: { rest: to.path.slice(1).split('/') } }
  return true
})

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Quellnode` : 'Quellnode'
})
