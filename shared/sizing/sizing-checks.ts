import type { ResponseQuantity, SizingInput } from '../schemas/sizing'
import { loadAmplitude } from './model-input'

export interface SizingChecks {
  /** the design load amplitude: N, m/s² of base acceleration or kg·m of unbalance (loadUnit) */
  forceAmplitude: number
  /** 'N', 'm/s²' or 'kg·m' */
  loadUnit: string
  quantity: ResponseQuantity
  /** peak response at the response node without / with the absorber (m, m/s or m/s²; under base
   * motion displacement is relative and acceleration absolute); without is null when unbounded,
   * with is Infinity when unbounded */
  responseWithout: number | null
  responseWith: number
  limit: number
  passes: boolean
  /** m, largest absorber stroke at the design load */
  stroke: number
  /** m, the stroke limit asked for, or null */
  strokeLimit: number | null
}

/**
 * The checks at the design load from the peaks per unit load (null: unbounded).
 * @param peaks without and with the absorber(s), the load's unit, the stroke (m) and its limit
 */
export function sizingChecks(
  input: SizingInput,
  peaks: {
    without: number | null
    with: number | null
    unit: string
    stroke: number
    strokeLimit: number | null
  },
): SizingChecks {
  const amplitude = loadAmplitude(input)
  const responseWith = (peaks.with ?? Infinity) * amplitude
  return {
    forceAmplitude: amplitude,
    loadUnit: peaks.unit,
    quantity: input.acceptance.quantity,
    responseWithout: peaks.without === null ? null : peaks.without * amplitude,
    responseWith,
    limit: input.acceptance.limit,
    passes: responseWith <= input.acceptance.limit,
    stroke: peaks.stroke,
    strokeLimit: peaks.strokeLimit,
  }
}
