import {
  createRouter,
  createWebHistory,
  type RouteComponent,
  type RouteRecordRaw,
} from 'vue-router'
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

/** Every view a route shows, by file name, each loaded the first time its page opens. */
const VIEWS = Object.fromEntries(
  Object.entries(
    import.meta.glob<RouteComponent>(['@/views/*View.vue', '@/features/*/*View.vue'], {
      import: 'default',
    }),
  ).map(([file, load]) => [file.replace(/^.*\/|\.vue$/g, ''), load]),
)

/**
 * One page: its name, address, title in the browser tab and the view (a file name under
 * src/views or a feature's folder); `props` hands the address's parameters to the view.
 */
function page(name: RouteName, path: string, title: string, view: string, props = false) {
  const component = VIEWS[view]
  if (!component) throw new Error(`No view ${view} for the page ${name}`)
  return { name, path, component, props, meta: { title } } satisfies RouteRecordRaw
}

const routes = [
  page('home', '/', 'Overview', 'HomeView'),
  page('sign-in', '/sign-in', 'Sign in', 'SignInView'),
  page('set-password', '/set-password', 'Set password', 'SetPasswordView'),
  page('forgot-password', '/forgot-password', 'Forgot password', 'ForgotPasswordView'),
  page('admin-users', '/admin/users', 'Users', 'AdminUsersView'),
  page('admin-refunds', '/admin/refunds', 'Second payments', 'PaymentRefundsView'),
  page('admin-tax', '/admin/tax', 'Tax rates', 'AdminTaxView'),
  page('admin-audit', '/admin/audit', 'Audit trail', 'AdminAuditView'),
  page('portal', '/portal', 'Your quotes', 'PortalView'),
  page('portal-quote', '/portal/quotes/:id', 'Quote', 'PortalQuoteView'),
  page('portal-payment-done', '/portal/payment/done', 'Payment', 'PaymentDoneView'),
  page('sites', '/sites', 'Sites', 'SitesView'),
  page('site', '/sites/:id(\\d+)', 'Site', 'SiteView', true),
  page('site-records', '/sites/:id(\\d+)/records', 'Measurements', 'SiteRecordsView', true),
  page('sizings', '/sizings', 'Sizings', 'SizingsView'),
  page('sizing-new', `/sizings/new/${STEP_PATTERN}`, 'New sizing', 'SizingWorkspaceView', true),
  page('sizing', `/sizings/:id(\\d+)/${STEP_PATTERN}`, 'Sizing', 'SizingWorkspaceView', true),
  page('work-orders', '/work-orders', 'Work orders', 'WorkOrdersView'),
  page('work-order', '/work-orders/:id', 'Work order', 'WorkOrderView'),
  page('quotes', '/quotes', 'Quotes', 'QuoteListView'),
  page('quote-new', '/quotes/new', 'New quote', 'QuoteBuilderView'),
  page('quote', '/quotes/:id(\\d+)', 'Quote', 'QuoteDetailView'),
  page('quote-edit', '/quotes/:id(\\d+)/edit', 'Change quote', 'QuoteBuilderView'),
  page('catalogue', '/admin/catalogue', 'Catalogue', 'CatalogueListView'),
  page('customers', '/customers', 'Customers', 'CustomerListView'),
  page('customer', '/customers/:id(\\d+)', 'Customer', 'CustomerDetailView'),
  page('not-found', '/:rest(.*)*', 'Not found', 'NotFoundView'),
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
