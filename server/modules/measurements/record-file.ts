import {
  identifyPeakAt,
  identifyRecord,
  isRecordError,
  parseRecordBytes,
  type IdentificationResult,
  type IdentifiedPeak,
  type ParsedRecord,
  type RecordKind,
  type TimeUnit,
} from '../../../shared/measurements'
import { AppError } from '../../http/app-error'
import type { ReadAs } from '../../workers/measurements.worker'

const TEXT_NAME = /\.(csv|txt)$/i

function refused(message: string, status: number) {
  return new AppError('invalid-record', message, status, [{ path: 'file.record', message }])
}

/** A refused file as the API answers it: wrong type 415, a defect in the content 400. */
function asAppError(e: unknown): unknown {
  if (isRecordError(e)) return refused(e.message, e.code === 'encoding' ? 415 : 400)
  if (e instanceof RangeError) return refused(e.message, 400)
  return e
}

/** Checks an upload is a text record before any of it is read as numbers. */
export function checkRecordFile<F extends { originalname: string }>(file: F | undefined): F {
  if (!file) throw refused('Attach a record file in the field "record".', 400)
  if (!TEXT_NAME.test(file.originalname)) {
    throw refused('A record must be a .csv or .txt text file.', 415)
  }
  return file
}

/** A stored record is read again exactly as at its upload. */
export function readAsStored(r: {
  rateFromForm: boolean
  sampleRateHz: number
  timeUnit: TimeUnit | null
}): ReadAs {
  return {
    ...(r.rateFromForm && { sampleRateHz: r.sampleRateHz }),
    ...(r.timeUnit && { timeUnit: r.timeUnit }),
  }
}

/** Reads a record file with every channel; a refused file is a 4xx naming the line. */
export function readRecord(bytes: Uint8Array, readAs: ReadAs): ParsedRecord {
  try {
    return parseRecordBytes(bytes, readAs)
  } catch (e) {
    throw asAppError(e)
  }
}

/** Identifies the modes of a read record, with the reader's warnings kept. */
export function identify(record: ParsedRecord, kind?: RecordKind): IdentificationResult {
  try {
    const result = identifyRecord(record, kind ? { kind } : {})
    return { ...result, warnings: [...record.warnings, ...result.warnings] }
  } catch (e) {
    throw asAppError(e)
  }
}

/** The peak nearest a frequency the engineer picked, as a 400 naming the field if impossible. */
export function peakAt(
  record: ParsedRecord,
  frequencyHz: number,
  kind: RecordKind,
  otherPeaksHz: number[],
): IdentifiedPeak {
  try {
    return identifyPeakAt(record, frequencyHz, { kind, otherPeaksHz })
  } catch (e) {
    if (e instanceof RangeError) {
      throw new AppError('invalid-peak', e.message, 400, [
        { path: 'body.frequencyHz', message: e.message },
      ])
    }
    throw e
  }
}
