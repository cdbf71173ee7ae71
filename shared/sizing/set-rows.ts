import type { SizingSummary } from '../schemas/sizing'

const sig = (v: number, d = 3) => Number(v.toPrecision(d)).toLocaleString('en-GB')

/**
 * A sizing's absorbers in words, one row each after the set's total, for the quote screen and
 * PDF; none for a single absorber (whose rows say it all).
 */
export function setRows(s: Pick<SizingSummary, 'absorbers' | 'totalMass'>): [string, string][] {
  const units = s.absorbers
  if (!units || units.length < 2) return []
  return [
    ['Absorbers', `${units.length} units, ${sig(s.totalMass ?? 0)} kg in all, tuned together`],
    ...units.map((u, i): [string, string] => [
      `Absorber ${i + 1}`,
      `mode ${u.targetMode} at ${u.node}: ${sig(u.mass)} kg (${sig(u.massRatio * 100)} % of ` +
        `${sig(u.effectiveMass)} kg), ${sig(u.frequencyHz)} Hz, ζ ${sig(u.dampingRatio)}`,
    ]),
  ]
}
