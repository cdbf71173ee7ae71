import type { Services } from '../server/app'

/** Invented demo tax rates: a standard default and a reduced one. Running it again changes nothing. */
export async function seedTaxRates(s: Services) {
  const { rates } = await s.tax.settings()
  if (rates.length) return
  await s.tax.save(null, { name: 'Standard', rateBp: 2000, isDefault: true })
  await s.tax.save(null, { name: 'Reduced', rateBp: 500, isDefault: false })
}
