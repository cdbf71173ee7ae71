import type { IdentificationResult, RecordKind } from '../../shared/measurements'
import { AppError } from '../http/app-error'
import { identify, readRecord } from '../modules/measurements/record-file'

export interface RecordJob {
  bytes: Uint8Array
  /** Hz, only for a file without a time column */
  sampleRateHz?: number
  kind?: RecordKind
}

export type RecordOutcome =
  | { ok: true; sampleRateHz: number; samples: number; result: IdentificationResult }
  | { ok: false; code: string; message: string; status: number; details?: unknown }

/**
 * Reads a record file and identifies its modes in a worker thread, so a large upload never holds
 * up other requests. A refusal comes back as data (errors lose their class crossing threads).
 */
export default function run(job: RecordJob): RecordOutcome {
  try {
    const record = readRecord(job.bytes, job.sampleRateHz)
    const result = identify(record, job.kind)
    return {
      ok: true,
      sampleRateHz: record.sampleRateHz,
      samples: record.acceleration.length,
      result,
    }
  } catch (e) {
    if (e instanceof AppError)
      return { ok: false, code: e.code, message: e.message, status: e.status, details: e.details }
    throw e
  }
}
