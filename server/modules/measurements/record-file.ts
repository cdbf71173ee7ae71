import {
  identifyPeakAt,
  identifyRecord,
  isRecordError,
  parseRecordBytes,
  type IdentificationResult,
  type IdentifiedPeak,
  type ParsedRecord,
  type RecordKind,
} from '../../../shared/measurements'
import { AppError } from '../../http/app-error'

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
export function checkRecordFile(file: { originalname: string; buffer: Buffer } | undefined) {
  if (!file) throw refused('Attach a record file in the field "record".', 400)
  if (!TEXT_NAME.test(file.originalname)) {
    throw refused('A record must be a .csv or .txt text file.', 415)
  }
  return file
}

/** Reads a record file; the rate is only passed for a file without a time column. */
export function readRecord(bytes: Uint8Array, sampleRateHz?: number): ParsedRecord {
  try {
    return parseRecordBytes(bytes, sampleRateHz === undefined ? {} : { sampleRateHz })
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
