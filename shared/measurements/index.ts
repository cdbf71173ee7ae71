/**
 * Site measurements: read an acceleration record, compute its spectrum and identify natural
 * frequencies and damping ratios. Pure: no I/O; runs in the browser and on the server.
 */
export { identifyRecord } from './identify'
export { identifyModes } from './identify-modes'
export {
  identifyModesSsi,
  type SsiIdentification,
  type SsiMode,
  type SsiOptions,
} from './identify-modes-ssi'
export type { DiagramPole, StabilityCriteria } from './stabilisation'
export type {
  IdentifiedMode,
  ModalIdentification,
  ModalOptions,
  MultiChannelRecord,
} from './modal-types'
export type { DecayLevels } from './correlation-decay'
export { mac, realShape, type ShapeVector } from './mac'
export type { ComplexArray } from './hermitian-eigen'
export { MAX_PLAUSIBLE_DAMPING, type ResultFlag } from './plausibility'
export { identifyPeakAt, type PeakAtOptions } from './identify-peak-at'
export { parseRecordBytes, parseRecordCsv, type ParsedRecord } from './parse-csv'
export type { ParseRecordOptions } from './parse-options'
export {
  CHANNEL_DIRECTIONS,
  type ChannelDirection,
  type ChannelMapping,
  type RecordChannel,
} from './channels'
export { timeUnitFromName, type TimeUnit, type TimeUnitSource } from './time-unit'
export { decodeRecordBytes } from './decode'
export { RecordError, isRecordError, type RecordErrorCode } from './record-error'
export { dampingFromLogDecrement, logDecrementFromDamping } from './log-decrement'
export { halfPowerBand, type HalfPowerBand } from './half-power'
export { detectRecordKind, type RecordKind } from './record-kind'
export type { IdentificationResult, IdentifiedPeak, IdentifyOptions, RecordSamples } from './types'
export type { LogDecrementFit } from './log-decrement'
