import type { Role } from '@shared/schemas/auth'
import type { RouteName } from './router'

export interface NavItem {
  name: RouteName
  label: string
  icon: string
  roles: readonly Role[]
}

/** The menu; each role sees the entries it may open and nothing else. */
export const NAV_ITEMS: NavItem[] = [
  {
    name: 'home',
    label: 'Overview',
    icon: 'pi pi-home',
    roles: ['engineer', 'sales', 'customer', 'production', 'admin'],
  },
  { name: 'sites', label: 'Sites', icon: 'pi pi-map-marker', roles: ['engineer', 'admin'] },
  {
    name: 'sizings',
    label: 'Sizings',
    icon: 'pi pi-sliders-h',
    roles: ['engineer', 'sales', 'admin'],
  },
  { name: 'quotes', label: 'Quotes', icon: 'pi pi-file-edit', roles: ['sales', 'admin'] },
  { name: 'customers', label: 'Customers', icon: 'pi pi-building', roles: ['sales', 'admin'] },
  { name: 'catalogue', label: 'Catalogue', icon: 'pi pi-box', roles: ['admin'] },
  { name: 'admin-users', label: 'Users', icon: 'pi pi-users', roles: ['admin'] },
  { name: 'admin-refunds', label: 'Refunds', icon: 'pi pi-replay', roles: ['admin'] },
  { name: 'admin-tax', label: 'Tax rates', icon: 'pi pi-percentage', roles: ['admin'] },
  { name: 'admin-audit', label: 'Audit trail', icon: 'pi pi-history', roles: ['admin'] },
  { name: 'portal', label: 'My quotes', icon: 'pi pi-file', roles: ['customer'] },
  {
    name: 'work-orders',
    label: 'Work orders',
    icon: 'pi pi-wrench',
    roles: ['production', 'admin'],
  },
]

export function navFor(role: Role | null): NavItem[] {
  return role ? NAV_ITEMS.filter((i) => i.roles.includes(role)) : []
}
