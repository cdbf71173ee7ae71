import type { Tuning } from '../closed-forms'
import type { SetContext } from './set-context'

/** Smallest damping ratio and spread a search starts from: it works on their logarithms. */
const FLOOR = 1e-3

/**
 * What the search varies: one unit's (ln f, ln ζ_a), or a spread family of units on one mode,
 * (ln f_c, ln w, ln ζ_a) with f_j = f_c(1 + w(j/(n−1) − ½)) and one damping ratio — the uniform
 * spread of Xu & Igusa (1992) and Yamaguchi & Harnpornchai (1993) (memory), three numbers
 * whatever the number of units.
 */
export interface Block {
  units: number[]
  family: boolean
}

/**
 * The blocks of a search.
 * @param ctx set context
 * @param free indices of the optimised units
 * @param families group the units of one mode into a spread family (else one block per unit)
 */
export function searchBlocks(ctx: SetContext, free: number[], families: boolean): Block[] {
  if (!families) return free.map((i) => ({ units: [i], family: false }))
  const byMode = new Map<number, number[]>()
  for (const i of free) {
    const mode = ctx.units[i]?.mode ?? 0
    byMode.set(mode, [...(byMode.get(mode) ?? []), i])
  }
  return [...byMode.values()].map((units) => ({ units, family: units.length > 1 }))
}

/** The search point of a set of tunings (a family's centre, width and damping from its units). */
export function encode(blocks: Block[], t: Tuning[]): number[] {
  return blocks.flatMap((b) => {
    const ts = b.units.map((i) => t[i] ?? { frequencyRatio: 1, dampingRatio: 0.1 })
    const lnz = ts.reduce((s, x) => s + Math.log(Math.max(x.dampingRatio, FLOOR)), 0) / ts.length
    if (!b.family) return [Math.log(ts[0]?.frequencyRatio ?? 1), lnz]
    const f = ts.map((x) => x.frequencyRatio)
    const centre = f.reduce((s, x) => s + x, 0) / f.length
    const width = (Math.max(...f) - Math.min(...f)) / centre
    return [Math.log(centre), Math.log(Math.max(width, FLOOR)), lnz]
  })
}

/** The tunings of a search point; units outside the blocks keep `base`. */
export function decode(blocks: Block[], x: number[], base: Tuning[]): Tuning[] {
  const out = [...base]
  let q = 0
  for (const b of blocks) {
    if (!b.family) {
      out[b.units[0] ?? 0] = {
        frequencyRatio: Math.exp(x[q] ?? 0),
        dampingRatio: Math.exp(x[q + 1] ?? 0),
      }
      q += 2
      continue
    }
    const centre = Math.exp(x[q] ?? 0)
    const width = Math.exp(x[q + 1] ?? 0)
    const dampingRatio = Math.exp(x[q + 2] ?? 0)
    const n = b.units.length
    // Units keep their order by the start's frequencies, lowest first.
    b.units.forEach((i, j) => {
      out[i] = { frequencyRatio: centre * (1 + width * (j / (n - 1) - 0.5)), dampingRatio }
    })
    q += 3
  }
  return out
}

/** Initial simplex steps: frequency, spread width, damping (logarithms). */
export function searchSteps(blocks: Block[], coarse: boolean): number[] {
  const [f, w, z] = coarse ? [0.02, 0.3, 0.15] : [0.005, 0.1, 0.05]
  return blocks.flatMap((b) => (b.family ? [f, w, z] : [f, z]))
}
