import { readFileSync } from 'node:fs'
import { ModelError } from '../../shared/dynamics'
import {
  identifyModes,
  identifyModesSsi,
  isRecordError,
  parseRecordBytes,
  type TimeUnit,
} from '../../shared/measurements'
import { thinHistory } from '../../shared/measurements/thin-history'
import type {
  AnalysisMode,
  AnalysisRun,
  RecordAnalysis,
} from '../../shared/schemas/record-analysis'
import type { ModelInput } from '../../shared/schemas/model'
import {
  updateModel,
  type MeasuredMode,
  type ParameterGroup,
  type Sensor,
} from '../../shared/updating'

/** How a stored record file is read again: as at its upload. */
export interface ReadAs {
  sampleRateHz?: number
  timeUnit?: TimeUnit
}

/**
 * Work on measurements that takes too long for the event loop (0.1 s to a few seconds). A stored
 * record is read here from its path, so its bytes never pass through the event loop.
 */
export type MeasurementJob =
  | { kind: 'identify'; file: string; readAs: ReadAs; run: AnalysisRun }
  | { kind: 'history'; file: string; readAs: ReadAs; maxPoints: number }
  | {
      kind: 'update'
      model: ModelInput
      measured: MeasuredMode[]
      groups: ParameterGroup[]
      sensors: Sensor[]
    }

/** A refusal crosses the thread as data: errors lose their class on the way. */
export type MeasurementOutcome =
  { ok: true; value: unknown } | { ok: false; field: string; message: string }

const OPTION = /^(minFrequencyHz|maxFrequencyHz|maxOrder|blockRows)\b/

const asMode = (m: AnalysisMode): AnalysisMode => ({
  frequencyHz: m.frequencyHz,
  dampingRatio: m.dampingRatio,
  shape: m.shape,
  flags: m.flags,
  warnings: m.warnings,
})

function identify(
  job: Extract<MeasurementJob, { kind: 'identify' }>,
): Pick<RecordAnalysis, 'method' | 'modes' | 'result'> {
  const record = parseRecordBytes(readFileSync(job.file), job.readAs)
  const { method, ...range } = job.run
  const result = method === 'ssi' ? identifyModesSsi(record, range) : identifyModes(record, range)
  return { method, modes: result.modes.map(asMode), result }
}

function history(job: Extract<MeasurementJob, { kind: 'history' }>) {
  const record = parseRecordBytes(readFileSync(job.file), job.readAs)
  const accelerations = record.channels.map((c) => c.acceleration)
  const thin = thinHistory(record.sampleRateHz, record.startTimeS, accelerations, job.maxPoints)
  return {
    sampleRateHz: record.sampleRateHz,
    timeS: thin.timeS,
    channels: record.channels.map((c, i) => ({ name: c.name, values: thin.values[i] ?? [] })),
  }
}

function refusal(e: unknown): MeasurementOutcome {
  if (e instanceof ModelError) return { ok: false, field: e.field, message: e.message }
  if (isRecordError(e)) return { ok: false, field: 'file', message: e.message }
  if (e instanceof RangeError) {
    const option = OPTION.exec(e.message)?.[1]
    return { ok: false, field: option ?? '', message: e.message }
  }
  throw e
}

/** Runs in a worker thread of the engine pool (server/workers/pool.ts). */
export default function run(job: MeasurementJob): MeasurementOutcome {
  try {
    if (job.kind === 'identify') return { ok: true, value: identify(job) }
    if (job.kind === 'history') return { ok: true, value: history(job) }
    const { model, measured, groups, sensors } = job
    return { ok: true, value: updateModel(model, measured, groups, sensors) }
  } catch (e) {
    return refusal(e)
  }
}
