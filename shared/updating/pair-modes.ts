import { mac } from '../measurements/mac'
import { shapeAtSensors, type ModelModes, type SensorRow } from './model-modes'
import type { MeasuredMode } from './types'

/** A measured mode paired with a model mode (both 0-based). */
export interface Pairing {
  measured: number
  model: number | null
  mac: number | null
  by: 'mac' | 'frequency' | null
}

/**
 * Pair measured with model modes, each model mode used once: first by the modal assurance
 * criterion over the measured shapes, the best pair first, down to `threshold` (about 0.8 is
 * common practice); then measured modes without a shape, or whose shape matched no model
 * mode well enough, stay unpaired or — without a shape — take the unpaired model mode
 * nearest in frequency.
 * @param measured measured modes
 * @param m model modes
 * @param rows sensor rows (one per shape entry)
 * @param threshold least MAC for a pair
 */
export function pairModes(
  measured: MeasuredMode[],
  m: ModelModes,
  rows: SensorRow[],
  threshold: number,
): Pairing[] {
  const result: Pairing[] = measured.map((_, i) => ({
    measured: i,
    model: null,
    mac: null,
    by: null,
  }))
  const used = new Set<number>()
  const candidates: { i: number; r: number; mac: number }[] = []
  measured.forEach((mode, i) => {
    if (!mode.shape) return
    for (let r = 0; r < m.n; r++) {
      candidates.push({ i, r, mac: mac(mode.shape, shapeAtSensors(m, r, rows)) })
    }
  })
  candidates.sort((p, q) => q.mac - p.mac)
  for (const c of candidates) {
    const entry = result[c.i]!
    if (c.mac < threshold) break
    if (entry.model !== null || used.has(c.r)) continue
    Object.assign(entry, { model: c.r, mac: c.mac, by: 'mac' })
    used.add(c.r)
  }
  measured.forEach((mode, i) => {
    if (mode.shape) return
    let best: number | null = null
    for (let r = 0; r < m.n; r++) {
      if (used.has(r)) continue
      const d = Math.abs((m.frequencyHz[r] ?? 0) - mode.frequencyHz)
      if (best === null || d < Math.abs((m.frequencyHz[best] ?? 0) - mode.frequencyHz)) best = r
    }
    if (best === null) return
    Object.assign(result[i]!, { model: best, by: 'frequency' })
    used.add(best)
  })
  return result
}
