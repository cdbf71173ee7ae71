import { ROLES, type Role } from './schemas/auth'

/** Field work: the engineers who model and size, and the admin. */
const FIELD = ['engineer', 'admin'] as const satisfies readonly Role[]
/** Everyone at the supplier's desks who reads the field work. */
const OFFICE = ['engineer', 'sales', 'admin'] as const satisfies readonly Role[]
const SELLERS = ['sales', 'admin'] as const satisfies readonly Role[]
const BUILDERS = ['production', 'admin'] as const satisfies readonly Role[]
const ADMIN = ['admin'] as const satisfies readonly Role[]
const CUSTOMER = ['customer'] as const satisfies readonly Role[]

/**
 * Who may do what, in one table: the server's routes check these lists (the authority), and the
 * browser's route guard and menu read the pages below, which are built from them.
 */
export const ACCESS = {
  sites: { read: OFFICE, write: FIELD },
  models: { read: OFFICE, write: FIELD },
  measurements: { read: OFFICE, write: FIELD },
  sizings: { read: OFFICE, write: FIELD },
  companies: { read: OFFICE },
  customers: { read: SELLERS, write: SELLERS },
  /** a customer reads their own company's quotes, accepts and pays */
  quotes: { read: [...SELLERS, 'customer'], write: SELLERS, accept: CUSTOMER },
  /** product lines are read for matching and building; prices only by those who quote */
  catalogue: {
    read: ['engineer', 'sales', 'production', 'admin'],
    prices: SELLERS,
    match: ['engineer', ...SELLERS],
    write: ADMIN,
  },
  orders: { read: ['customer', 'sales', 'production', 'admin'] },
  refunds: { read: ADMIN },
  workOrders: { read: BUILDERS, write: BUILDERS },
  audit: { read: ADMIN },
  /** named tax rates: read by those who quote, set by the admin */
  tax: { read: SELLERS, write: ADMIN },
  users: { read: ADMIN, write: ADMIN },
} as const satisfies Record<string, Record<string, readonly Role[]>>

/** Pages anyone may open, signed in or not. */
export const PUBLIC_PAGES = ['sign-in', 'set-password', 'forgot-password', 'not-found'] as const

/** The pages behind sign-in, and the roles that may open each. */
export const PAGE_ACCESS = {
  home: ROLES,
  sites: ACCESS.sites.read,
  site: ACCESS.sites.read,
  'site-records': ACCESS.measurements.read,
  sizings: ACCESS.sizings.read,
  'sizing-new': ACCESS.sizings.write,
  sizing: ACCESS.sizings.read,
  quotes: ACCESS.quotes.write,
  'quote-new': ACCESS.quotes.write,
  quote: ACCESS.quotes.write,
  'quote-edit': ACCESS.quotes.write,
  customers: ACCESS.customers.read,
  customer: ACCESS.customers.read,
  catalogue: ACCESS.catalogue.write,
  'admin-users': ACCESS.users.write,
  'admin-refunds': ACCESS.refunds.read,
  'admin-tax': ACCESS.tax.write,
  'admin-audit': ACCESS.audit.read,
  portal: ACCESS.quotes.accept,
  'portal-quote': ACCESS.quotes.accept,
  'portal-payment-done': ACCESS.quotes.accept,
  'work-orders': ACCESS.workOrders.read,
  'work-order': ACCESS.workOrders.read,
} as const satisfies Record<string, readonly Role[]>

export type PublicPage = (typeof PUBLIC_PAGES)[number]
export type PageName = keyof typeof PAGE_ACCESS

/** The menu, in order; a role sees an entry exactly when it may open the page. */
export const MENU = [
  'home',
  'sites',
  'sizings',
  'quotes',
  'customers',
  'catalogue',
  'admin-users',
  'admin-refunds',
  'admin-tax',
  'admin-audit',
  'portal',
  'work-orders',
] as const satisfies readonly PageName[]

export type MenuPage = (typeof MENU)[number]

export function isPublicPage(name: string): name is PublicPage {
  return (PUBLIC_PAGES as readonly string[]).includes(name)
}

/** Whether a role may open a page; a page not in the table is open to nobody. */
export function mayOpen(role: Role, page: string): boolean {
  const roles: readonly Role[] | undefined = PAGE_ACCESS[page as PageName]
  return roles?.includes(role) ?? false
}

/** The menu entries a role sees. */
export function menuFor(role: Role | null): MenuPage[] {
  return role ? MENU.filter((page) => mayOpen(role, page)) : []
}
