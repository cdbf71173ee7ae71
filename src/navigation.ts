import { menuFor, type MenuPage } from '@shared/access'
import type { Role } from '@shared/schemas/auth'

export interface NavItem {
  name: MenuPage
  label: string
  icon: string
}

/** How each menu entry looks; who sees it is in the access table (`shared/access.ts`). */
const LOOKS: Record<MenuPage, Omit<NavItem, 'name'>> = {
  home: { label: 'Overview', icon: 'pi pi-home' },
  sites: { label: 'Sites', icon: 'pi pi-map-marker' },
  sizings: { label: 'Sizings', icon: 'pi pi-sliders-h' },
  quotes: { label: 'Quotes', icon: 'pi pi-file-edit' },
  customers: { label: 'Customers', icon: 'pi pi-building' },
  catalogue: { label: 'Catalogue', icon: 'pi pi-box' },
  'admin-users': { label: 'Users', icon: 'pi pi-users' },
  'admin-refunds': { label: 'Refunds', icon: 'pi pi-replay' },
  'admin-tax': { label: 'Tax rates', icon: 'pi pi-percentage' },
  'admin-audit': { label: 'Audit trail', icon: 'pi pi-history' },
  portal: { label: 'My quotes', icon: 'pi pi-file' },
  'work-orders': { label: 'Work orders', icon: 'pi pi-wrench' },
}

/** The menu of a role: the entries it may open, and nothing else. */
export function navFor(role: Role | null): NavItem[] {
  return menuFor(role).map((name) => ({ name, ...LOOKS[name] }))
}
