import type { Services } from '../server/app'
import type { CatalogueOptionInput, ProductLineInput } from '../shared/schemas/catalogue'

/** An invented catalogue of Tessera Damping Works: names, ranges and prices are made up. */
export const DEMO_PRODUCT_LINES: ProductLineInput[] = [
  {
    code: 'FLR-S',
    name: 'Floorline S',
    description: 'Compact viscous unit for office and gallery floors.',
    orientation: 'vertical',
    damperType: 'viscous-fluid',
    massMin: 40,
    massMax: 400,
    massStep: 10,
    frequencyMin: 3,
    frequencyMax: 12,
    strokeLimit: 0.025,
    dampingMin: 0.04,
    dampingMax: 0.2,
    leadTimeWeeks: 8,
    prices: { EUR: { base: 420_000, perKg: 1_800 }, GBP: { base: 365_000, perKg: 1_560 } },
    active: true,
  },
  {
    code: 'FLR-M',
    name: 'Floorline M',
    description: 'Larger floor unit in a steel cradle for long-span slabs.',
    orientation: 'vertical',
    damperType: 'viscous-fluid',
    massMin: 300,
    massMax: 2000,
    massStep: 25,
    frequencyMin: 2,
    frequencyMax: 8,
    strokeLimit: 0.04,
    dampingMin: 0.05,
    dampingMax: 0.25,
    leadTimeWeeks: 10,
    prices: { EUR: { base: 780_000, perKg: 1_450 }, GBP: { base: 678_000, perKg: 1_260 } },
    active: true,
  },
  {
    code: 'SPN-EC',
    name: 'Spanline EC',
    description: 'Contact-free eddy-current unit for footbridge spans.',
    orientation: 'vertical',
    damperType: 'eddy-current',
    massMin: 200,
    massMax: 3000,
    massStep: 50,
    frequencyMin: 0.8,
    frequencyMax: 5,
    strokeLimit: 0.06,
    dampingMin: 0.03,
    dampingMax: 0.15,
    leadTimeWeeks: 14,
    prices: { EUR: { base: 1_150_000, perKg: 1_600 }, GBP: { base: 1_000_000, perKg: 1_390 } },
    active: true,
  },
  {
    code: 'SDL-H',
    name: 'Sideline H',
    description: 'Horizontal pendulum-free unit on elastomer bearings for building sway.',
    orientation: 'horizontal',
    damperType: 'elastomer',
    massMin: 100,
    massMax: 1500,
    massStep: 25,
    frequencyMin: 0.5,
    frequencyMax: 4,
    strokeLimit: 0.08,
    dampingMin: 0.05,
    dampingMax: 0.12,
    leadTimeWeeks: 12,
    prices: { EUR: { base: 960_000, perKg: 1_700 }, GBP: { base: 835_000, perKg: 1_480 } },
    active: true,
  },
  {
    code: 'PIP-F',
    name: 'Pipeline F',
    description: 'Clamp-on friction unit for pipe runs and small machine frames.',
    orientation: 'horizontal',
    damperType: 'friction',
    massMin: 5,
    massMax: 80,
    massStep: 5,
    frequencyMin: 5,
    frequencyMax: 40,
    strokeLimit: 0.01,
    dampingMin: 0.05,
    dampingMax: 0.2,
    leadTimeWeeks: 6,
    prices: { EUR: { base: 98_000, perKg: 2_400 }, GBP: { base: 85_000, perKg: 2_090 } },
    active: true,
  },
]

export const DEMO_OPTIONS: CatalogueOptionInput[] = [
  {
    code: 'SITE-TUNE',
    name: 'Site tuning visit',
    kind: 'service',
    per: 'visit',
    prices: { EUR: 185_000, GBP: 160_000 },
    active: true,
  },
  {
    code: 'INSTALL',
    name: 'Installation by our crew',
    kind: 'service',
    per: 'unit',
    prices: { EUR: 240_000, GBP: 208_000 },
    active: true,
  },
  {
    code: 'FALL-RESTRAINT',
    name: 'Fall restraint cage',
    kind: 'option',
    per: 'unit',
    prices: { EUR: 69_000, GBP: 60_000 },
    active: true,
  },
  {
    code: 'SPARE-PLATE',
    name: 'Spare mass plate',
    kind: 'option',
    per: 'plate',
    prices: { EUR: 9_500, GBP: 8_200 },
    active: true,
  },
]

/** Invented contacts at the demo customers, so a demo quote has someone to go to. */
export const DEMO_CONTACTS = [
  {
    company: 'Marlow Quay Developments',
    contact: {
      name: 'Priya Halloran',
      email: 'customer@marlowquay.test',
      phone: '',
      position: 'Development manager',
    },
  },
] as const

/**
 * Product lines and options by code, and the demo contacts (after seedPeople); running it again
 * changes nothing.
 */
export async function seedCatalogue(s: Services) {
  const lines = new Set((await s.catalogue.listLines('admin', true)).map((l) => l.code))
  for (const l of DEMO_PRODUCT_LINES) if (!lines.has(l.code)) await s.catalogue.createLine(l)
  const options = new Set((await s.catalogue.listOptions(true)).map((o) => o.code))
  for (const o of DEMO_OPTIONS) if (!options.has(o.code)) await s.catalogue.createOption(o)
  for (const { company, contact } of DEMO_CONTACTS) {
    const c = await s.companies.findByName(company)
    if (!c) continue
    const known = (await s.customers.get(c.id)).contacts.some((x) => x.email === contact.email)
    if (!known) await s.customers.addContact(c.id, contact)
  }
}
