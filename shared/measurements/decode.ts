import { RecordError } from './record-error'

const SAVE_AS = 'save the file as UTF-8 (or plain ASCII) text and upload it again'

function lineAt(bytes: Uint8Array, index: number): number {
  let line = 1
  for (let i = 0; i < index; i++) if (bytes[i] === 0x0a) line++
  return line
}

/**
 * Decode an uploaded record file as UTF-8, refusing other encodings with a clear message
 * instead of parsing garbage: a UTF-16/UTF-32 byte-order mark, NUL bytes (UTF-16 text or a
 * binary file) or byte sequences that are not valid UTF-8 (e.g. Latin-1 text).
 * A UTF-8 byte-order mark is dropped.
 * @param bytes raw file content
 * @returns the text
 * @throws RecordError with code 'encoding' and the line of the first bad byte
 */
export function decodeRecordBytes(bytes: Uint8Array): string {
  const b0 = bytes[0]
  const b1 = bytes[1]
  if ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff)) {
    throw new RecordError('encoding', 1, `the file is UTF-16 encoded (byte-order mark); ${SAVE_AS}`)
  }
  const nul = bytes.indexOf(0)
  if (nul >= 0) {
    const why = 'NUL byte: the file looks UTF-16 encoded or binary'
    throw new RecordError('encoding', lineAt(bytes, nul), `${why}; ${SAVE_AS}`)
  }
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes)
  } catch {
    // The lenient decoder marks each bad sequence with U+FFFD, which gives the line.
    rejectReplacementCharacters(new TextDecoder('utf-8').decode(bytes))
    throw new RecordError('encoding', 1, `bytes that are not valid UTF-8; ${SAVE_AS}`)
  }
}

/**
 * Refuse text that holds U+FFFD replacement characters: a decoder met bytes that were not
 * UTF-8 (for instance a Latin-1 "µ" or "°" in a header) and the values may be corrupt.
 * @param text decoded file content
 * @throws RecordError with code 'encoding' naming the line
 */
export function rejectReplacementCharacters(text: string): void {
  const at = text.indexOf('\uFFFD')
  if (at < 0) return
  let line = 1
  for (let i = 0; i < at; i++) if (text.charCodeAt(i) === 10) line++
  throw new RecordError('encoding', line, `bytes that are not valid UTF-8; ${SAVE_AS}`)
}
