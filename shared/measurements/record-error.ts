/** Why a record file was refused; stable codes the server can map to an API error. */
export type RecordErrorCode =
  | 'empty'
  | 'encoding'
  | 'not-a-number'
  | 'column-count'
  | 'time-order'
  | 'uneven-sampling'
  | 'too-few-samples'
  | 'too-many-samples'
  | 'missing-sample-rate'
  | 'time-unit'

/**
 * A record file that cannot be read as a measurement. The message starts with
 * "line N: " so it can be shown as it is; `line` is 1-based.
 */
export class RecordError extends RangeError {
  override readonly name = 'RecordError'
  readonly code: RecordErrorCode
  readonly line: number

  /**
   * @param code what kind of defect
   * @param line 1-based line number of the defect in the file
   * @param detail what is wrong, without the line prefix
   */
  constructor(code: RecordErrorCode, line: number, detail: string) {
    super(`line ${line}: ${detail}`)
    this.code = code
    this.line = line
  }
}

/**
 * Type guard for a refused record file.
 * @param error anything caught
 */
export function isRecordError(error: unknown): error is RecordError {
  return error instanceof RecordError
}
