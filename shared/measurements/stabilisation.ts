import { mac, realShape } from './mac'
import type { Pole } from './ssi-cov'

/** When a pole counts as stable against the next lower model order. */
export interface StabilityCriteria {
  /** relative frequency change; default 0.01 */
  frequency: number
  /** relative damping change; default 0.05 */
  damping: number
  /** least MAC of the shapes; default 0.98 */
  mac: number
}

/** One point of the stabilisation diagram. */
export interface DiagramPole {
  order: number
  frequencyHz: number
  dampingRatio: number
  /** frequency, damping and shape all within the criteria of a pole one order below */
  stable: boolean
}

/** A mode read off the stabilisation diagram. */
export interface StableMode {
  frequencyHz: number
  dampingRatio: number
  shape: number[]
  shapeComplexity: number
  /** stable poles in its column of the diagram */
  stablePoles: number
}

function matches(p: Pole, q: Pole, c: StabilityCriteria): boolean {
  return (
    Math.abs(p.frequencyHz / q.frequencyHz - 1) <= c.frequency &&
    Math.abs(p.dampingRatio / q.dampingRatio - 1) <= c.damping &&
    mac(p.shape, q.shape) >= c.mac
  )
}

// Poles with ζ ≤ 0 (unstable) or ζ ≥ ½ (over-wide) are not vibration modes.
const physical = (p: Pole) => p.dampingRatio > 0 && p.dampingRatio < 0.5

/**
 * Mark the poles of each order that are stable against the order below: frequency within
 * 1 %, damping within 5 %, MAC ≥ 0.98 (the usual criteria, common practice; Peeters & De
 * Roeck 1999 for the diagram).
 * @param byOrder poles per order, orders ascending
 * @param orders the model orders
 * @param c criteria
 */
export function stabilisationDiagram(
  byOrder: Pole[][],
  orders: number[],
  c: StabilityCriteria,
): { diagram: DiagramPole[]; stable: { order: number; pole: Pole }[] } {
  const diagram: DiagramPole[] = []
  const stable: { order: number; pole: Pole }[] = []
  byOrder.forEach((poles, k) => {
    const below = k > 0 ? byOrder[k - 1]! : []
    for (const p of poles) {
      const ok = physical(p) && below.some((q) => physical(q) && matches(p, q, c))
      diagram.push({
        order: orders[k]!,
        frequencyHz: p.frequencyHz,
        dampingRatio: p.dampingRatio,
        stable: ok,
      })
      if (ok) stable.push({ order: orders[k]!, pole: p })
    }
  })
  return { diagram, stable }
}

// Over-fitted orders add poles that copy a real mode's shape a few per cent away from it; a
// column with the same shape within this of a column with more stable poles is such a
// companion and is dropped (a heuristic of ours: modes that close with one shape at the
// sensors could not be told apart anyway).
const COMPANION = 0.1

const median = (x: number[]) => {
  const s = [...x].sort((a, b) => a - b)
  return s.length % 2 ? s[(s.length - 1) / 2]! : (s[s.length / 2 - 1]! + s[s.length / 2]!) / 2
}

/**
 * Modes from the stable poles: columns of poles within the frequency criterion of each other
 * and with alike shapes; a column with at least `minPoles` stable poles is a mode, with the
 * median frequency and damping and the shape of its highest-order pole, unless it is the
 * companion of a stronger column (same shape, within 10 %).
 * @param stable stable poles with their orders
 * @param c criteria (frequency and MAC tolerances group a column)
 * @param minPoles fewest stable poles for a mode
 */
export function modesFromDiagram(
  stable: { order: number; pole: Pole }[],
  c: StabilityCriteria,
  minPoles: number,
): StableMode[] {
  const sorted = [...stable].sort((a, b) => a.pole.frequencyHz - b.pole.frequencyHz)
  const columns: { order: number; pole: Pole }[][] = []
  for (const s of sorted) {
    const column = columns.find((col) => {
      const f = median(col.map((x) => x.pole.frequencyHz))
      return (
        Math.abs(s.pole.frequencyHz / f - 1) <= c.frequency &&
        mac(s.pole.shape, col[0]!.pole.shape) >= c.mac
      )
    })
    if (column) column.push(s)
    else columns.push([s])
  }
  const count = (col: { order: number }[]) => new Set(col.map((x) => x.order)).size
  const strong = columns.filter((col) => count(col) >= minPoles).sort((a, b) => count(b) - count(a))
  const kept: typeof strong = []
  for (const col of strong) {
    const f = median(col.map((x) => x.pole.frequencyHz))
    const twin = kept.some((k) => {
      const g = median(k.map((x) => x.pole.frequencyHz))
      return Math.abs(f / g - 1) <= COMPANION && mac(col[0]!.pole.shape, k[0]!.pole.shape) >= c.mac
    })
    if (!twin) kept.push(col)
  }
  return kept
    .sort((a, b) => a[0]!.pole.frequencyHz - b[0]!.pole.frequencyHz)
    .map((col) => {
      const top = col.reduce((a, b) => (b.order > a.order ? b : a))
      const { shape, complexity } = realShape(top.pole.shape)
      return {
        frequencyHz: median(col.map((x) => x.pole.frequencyHz)),
        dampingRatio: median(col.map((x) => x.pole.dampingRatio)),
        shape,
        shapeComplexity: complexity,
        stablePoles: new Set(col.map((x) => x.order)).size,
      }
    })
}
