import { checkChannels, strongest } from './modal-analysis'
import type { MultiChannelRecord } from './modal-types'
import { outputCovariances } from './output-covariances'
import { detectRecordKind, type RecordKind } from './record-kind'
import { dampingWarning, shortRecordWarning, type ResultFlag } from './plausibility'
import { ssiCovPoles } from './ssi-cov'
import {
  modesFromDiagram,
  stabilisationDiagram,
  type DiagramPole,
  type StabilityCriteria,
} from './stabilisation'

/** How to run covariance-driven subspace identification; every field is optional. */
export interface SsiOptions {
  /** 'ambient' or 'decay' (only an ambient record is checked for its length); detected */
  kind?: RecordKind
  /** highest model order (even); default 40, at most channels × block rows */
  maxOrder?: number
  /** block rows i (lags 1…2i−1 enter); default one period of minFrequencyHz, ≥ maxOrder/l + 1 */
  blockRows?: number
  /**
   * lowest frequency of interest, Hz: it sets the default block rows (lags spanning one of its
   * periods) and no lower pole is reported. Default: block rows as for sample rate / 20, poles
   * from 0 Hz up. At a high sample rate give it for slow modes.
   */
  minFrequencyHz?: number
  /** highest frequency reported, Hz; default 0.45 × sample rate */
  maxFrequencyHz?: number
  /** stability tolerances; default 1 % frequency, 5 % damping, MAC 0.98 */
  criteria?: Partial<StabilityCriteria>
  /** fewest stable poles for a mode; default a quarter of the orders, at least 3 */
  minStablePoles?: number
}

/** A mode read off the stabilisation diagram. */
export interface SsiMode {
  frequencyHz: number
  dampingRatio: number
  /** one entry per channel in column order, largest 1 */
  shape: number[]
  shapeComplexity: number
  stablePoles: number
  flags: ResultFlag[]
  warnings: string[]
}

/** The result of SSI-COV on a record, ready to send as JSON. */
export interface SsiIdentification {
  sampleRateHz: number
  durationS: number
  channelCount: number
  kind: RecordKind
  method: 'ssi-cov'
  blockRows: number
  orders: number[]
  /** every pole of every order, for the stabilisation diagram */
  diagram: DiagramPole[]
  /** ascending frequency */
  modes: SsiMode[]
  flags: ResultFlag[]
  warnings: string[]
}

// The block Toeplitz matrix is (l·i)², kept to a size one SVD handles at once.
const MAX_ROWS = 400

function settings(record: MultiChannelRecord, l: number, o: SsiOptions) {
  const fs = record.sampleRateHz
  const fLow = o.minFrequencyHz ?? fs / 20
  const maxOrder = o.maxOrder ?? 40
  if (!(Number.isInteger(maxOrder) && maxOrder >= 2)) {
    throw new RangeError(`maxOrder must be an integer ≥ 2, got ${maxOrder}`)
  }
  const wanted = o.blockRows ?? Math.max(Math.ceil(maxOrder / l) + 1, Math.ceil(fs / fLow))
  const blockRows = Math.min(wanted, Math.floor(MAX_ROWS / l))
  if (!(Number.isInteger(blockRows) && blockRows * l >= maxOrder && blockRows >= 2)) {
    throw new RangeError(`blockRows × channels must reach maxOrder ${maxOrder}, got ${blockRows}`)
  }
  const orders = Array.from({ length: Math.floor(maxOrder / 2) }, (_, k) => 2 * (k + 1))
  const criteria = { frequency: 0.01, damping: 0.05, mac: 0.98, ...o.criteria }
  const minPoles = o.minStablePoles ?? Math.max(3, Math.floor(orders.length / 4))
  const fMin = o.minFrequencyHz ?? 0
  return { fMin, fHigh: o.maxFrequencyHz ?? 0.45 * fs, blockRows, orders, criteria, minPoles }
}

/**
 * Operational modal analysis by covariance-driven stochastic subspace identification
 * (SSI-COV; Peeters & De Roeck, Mech. Syst. Signal Process. 13, 1999): output covariances
 * of all channels, block Toeplitz matrix, state-space models of increasing order, a
 * stabilisation diagram (poles stable in frequency, damping and MAC against the order below)
 * and the modes it shows. Sensor noise uncorrelated in time only enters the zero lag, which
 * the method does not use.
 * @param record channels in m/s² of equal length, sample rate in Hz (a ParsedRecord fits)
 * @param options see SsiOptions
 * @throws RangeError naming the field for a bad record or option
 */
export function identifyModesSsi(
  record: MultiChannelRecord,
  options: SsiOptions = {},
): SsiIdentification {
  const y = checkChannels(record)
  const l = y.length
  const s = settings(record, l, options)
  const fs = record.sampleRateHz
  const r = outputCovariances(y, 2 * s.blockRows - 1)
  const inBand = (p: { frequencyHz: number }) => p.frequencyHz >= s.fMin && p.frequencyHz <= s.fHigh
  const byOrder = ssiCovPoles(r, l, s.blockRows, s.orders, fs).map((poles) => poles.filter(inBand))
  const { diagram, stable } = stabilisationDiagram(byOrder, s.orders, s.criteria)
  const durationS = (y[0]?.length ?? 0) / fs
  const warnings: string[] = []
  const found = modesFromDiagram(stable, s.criteria, s.minPoles)
  const kind = options.kind ?? detectRecordKind(strongest(y))
  const lowest = kind === 'ambient' ? (found[0]?.frequencyHz ?? null) : null
  const short = shortRecordWarning(durationS, lowest)
  const flags: ResultFlag[] = short ? ['short-record'] : []
  if (short) warnings.push(short)
  if (found.length === 0) warnings.push('no mode stable over enough model orders')
  const modes = found.map((m) => {
    const implausible = dampingWarning(m.frequencyHz, [m.dampingRatio])
    return {
      ...m,
      flags: [...(implausible ? (['damping-out-of-range'] as const) : []), ...flags],
      warnings: implausible ? [implausible] : [],
    }
  })
  return {
    sampleRateHz: fs,
    durationS,
    channelCount: l,
    kind,
    method: 'ssi-cov',
    blockRows: s.blockRows,
    orders: s.orders,
    diagram,
    modes,
    flags,
    warnings,
  }
}
