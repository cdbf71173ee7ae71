import type { Role } from '../shared/schemas/auth'

/** An invented supplier and two invented customers; names and places are made up. */
export const SUPPLIER = {
  name: 'Tessera Damping Works Ltd',
  address: 'Unit 4, Kiln Lane, Harwick HW3 9QT',
}

export const CUSTOMERS = [
  { name: 'Marlow Quay Developments', address: 'Quay House, 12 Ropewalk, Port Elvan PE1 4DA' },
  { name: 'Brackenfield Foods plc', address: 'Mill Road Works, Brackenfield BF7 2LN' },
] as const

export interface DemoUser {
  email: string
  name: string
  role: Role
  password: string
  company?: string
}

export const DEMO_USERS: DemoUser[] = [
  {
    email: 'engineer@quellnode.test',
    name: 'Ines Okafor',
    role: 'engineer',
    password: 'demo-engineer-1',
  },
  { email: 'sales@quellnode.test', name: 'Tomasz Reed', role: 'sales', password: 'demo-sales-1' },
  {
    email: 'customer@marlowquay.test',
    name: 'Priya Halloran',
    role: 'customer',
    password: 'demo-customer-1',
    company: 'Marlow Quay Developments',
  },
  {
    email: 'production@quellnode.test',
    name: 'Aled Varga',
    role: 'production',
    password: 'demo-production-1',
  },
  {
    email: 'admin@quellnode.test',
    name: 'Ruth Castellano',
    role: 'admin',
    password: 'demo-admin-1',
  },
]
