import { readFileSync } from 'node:fs'
import type {
  IdentifiedPeak,
  RecordKind,
  TimeUnit,
  TimeUnitSource,
} from '../../shared/measurements'
import { AppError } from '../http/app-error'
import { identify, peakAt, readRecord } from '../modules/measurements/record-file'
import type { ReadAs } from './measurements.worker'

export interface RecordJob {
  /** the stored file's path: read here, so its bytes never pass through the event loop */
  file: string
  /** how to read the file: a sample rate for a file without a time column, the time unit */
  readAs: ReadAs
  kind?: RecordKind
}

/** What an upload stores of a read record: its rate, length, channels and time unit. */
export interface ReadSummary {
  channels: { name: string; column: number }[]
  timeUnit: TimeUnit | null
  timeUnitSource: TimeUnitSource | null
}

/** A refusal crosses the thread as data: errors lose their class on the way. */
type Refusal = { ok: false; code: string; message: string; status: number; details?: unknown }

/**
 * A read and identified record. The identification (~80 kB of JSON with its spectrum) comes as
 * the JSON text the row stores and the answer carries as it is (server/http/json-text.ts): the
 * event loop neither copies it in as objects nor stringifies it again.
 */
export type RecordOutcome =
  | {
      ok: true
      sampleRateHz: number
      samples: number
      record: ReadSummary
      kind: RecordKind
      peakCount: number
      /** JSON.stringify of the IdentificationResult */
      resultJson: string
    }
  | Refusal

/** A peak the engineer points at, near a frequency, in a stored record. */
export interface PeakJob {
  file: string
  readAs: ReadAs
  frequencyHz: number
  kind: RecordKind
  /** the record's peaks already listed */
  otherPeaksHz: number[]
}

export type PeakOutcome = { ok: true; peak: IdentifiedPeak } | Refusal

function refusal(e: unknown): Refusal {
  if (e instanceof AppError)
    return { ok: false, code: e.code, message: e.message, status: e.status, details: e.details }
  throw e
}

/**
 * Reads a record file and identifies its modes in a worker thread, so a large upload never holds
 * up other requests.
 */
export default function run(job: RecordJob): RecordOutcome {
  try {
    const record = readRecord(readFileSync(job.file), job.readAs)
    const result = identify(record, job.kind)
    return {
      ok: true,
      sampleRateHz: record.sampleRateHz,
      samples: record.acceleration.length,
      record: {
        channels: record.channels.map((c) => ({ name: c.name, column: c.column })),
        timeUnit: record.timeUnit,
        timeUnitSource: record.timeUnitSource,
      },
      kind: result.kind,
      peakCount: result.peaks.length,
      resultJson: JSON.stringify(result),
    }
  } catch (e) {
    return refusal(e)
  }
}

/** Reads a stored record and identifies the peak nearest a frequency (Piscina task `peak`). */
export function peak(job: PeakJob): PeakOutcome {
  try {
    const record = readRecord(readFileSync(job.file), job.readAs)
    return { ok: true, peak: peakAt(record, job.frequencyHz, job.kind, job.otherPeaksHz) }
  } catch (e) {
    return refusal(e)
  }
}
