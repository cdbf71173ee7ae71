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
  { name: 'admin-users', label: 'Users', icon: 'pi pi-users', roles: ['admin'] },
]

export function navFor(role: Role | null): NavItem[] {
  return role ? NAV_ITEMS.filter((i) => i.roles.includes(role)) : []
}
