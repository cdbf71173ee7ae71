import { describe, expect, it } from 'vitest'
import {
  decodeRecordBytes,
  parseRecordBytes,
  parseRecordCsv,
} from '../../shared/measurements/index'
import { recordCsv } from './helpers/csv'
import { refusal } from './helpers/refusal'

const wave = Array.from({ length: 100 }, (_, j) => Math.sin(j / 5))
const good = recordCsv(wave, { sampleRateHz: 100, header: 'time_s,acceleration_m_s2' })

describe('parseRecordCsv', () => {
  it('reads time and acceleration with a header and derives the sample rate', () => {
    const r = parseRecordCsv(good)
    expect(r.sampleRateHz).toBeCloseTo(100, 9)
    expect(r.acceleration.length).toBe(100)
    expect(r.acceleration[7]).toBeCloseTo(Math.sin(7 / 5), 5)
    expect(r.columnNames).toEqual(['time_s', 'acceleration_m_s2'])
  })

  it('reads semicolon files with a decimal comma and tab files without a header', () => {
    const semicolon = good.replace('time_s,', 'time_s;').replace(/(\d),(-?\d)/g, '$1;$2')
    const decimalComma = semicolon.replace(/(\d)\.(\d)/g, '$1,$2')
    expect(parseRecordCsv(decimalComma).acceleration[7]).toBeCloseTo(Math.sin(7 / 5), 5)
    const tab = recordCsv(wave, { sampleRateHz: 50, separator: '\t' })
    expect(parseRecordCsv(tab).sampleRateHz).toBeCloseTo(50, 9)
  })

  it('reads one acceleration column at the given sample rate', () => {
    const r = parseRecordCsv(recordCsv(wave), { sampleRateHz: 256 })
    expect(r.sampleRateHz).toBe(256)
    expect(r.acceleration.length).toBe(100)
  })

  it('refuses an empty file, and one with a header only', () => {
    expect(refusal(() => parseRecordCsv('')).message).toBe(
      'line 1: the file is empty: no samples found',
    )
    const headerOnly = refusal(() => parseRecordCsv('time,acc\n'))
    expect(headerOnly.code).toBe('empty')
    expect(headerOnly.message).toBe('line 1: 0 samples found, at least 64 are needed')
  })

  it('names the line and column of a value that is not a number', () => {
    const lines = good.split('\n')
    lines[6] = '0.05,abc'
    const e = refusal(() => parseRecordCsv(lines.join('\n')))
    expect(e.code).toBe('not-a-number')
    expect(e.message).toBe("line 7: column 2: 'abc' is not a number")
    expect(e.line).toBe(7)
  })

  it('names the line with the wrong number of columns', () => {
    const lines = good.split('\n')
    lines[9] = `${lines[9]},3.1`
    const e = refusal(() => parseRecordCsv(lines.join('\n')))
    expect(e.message).toBe('line 10: expected 2 columns, found 3')
  })

  it('names the line where time does not increase', () => {
    const lines = good.split('\n')
    lines[20] = lines[19] ?? ''
    const e = refusal(() => parseRecordCsv(lines.join('\n')))
    expect(e.code).toBe('time-order')
    expect(e.message).toBe('line 21: time 0.18 is not after the previous 0.18')
  })

  it('names the line where the sampling is uneven beyond the tolerance', () => {
    const lines = good.split('\n')
    lines[30] = `0.2925,${wave[29]}`
    const e = refusal(() => parseRecordCsv(lines.join('\n')))
    expect(e.code).toBe('uneven-sampling')
    expect(e.line).toBe(31)
    expect(e.message).toMatch(/^line 31: time step 0\.0125 s differs from the mean step 0\.01 s/)
  })

  it('refuses too few samples, too many and a single column without a sample rate', () => {
    const short = recordCsv(wave.slice(0, 10), { sampleRateHz: 100 })
    expect(refusal(() => parseRecordCsv(short)).message).toBe(
      'line 10: 10 samples found, at least 64 are needed',
    )
    const many = refusal(() => parseRecordCsv(good, { maxSamples: 50 }))
    expect(many.message).toBe(
      'line 52: more than 50 samples: shorten the record or lower its sample rate',
    )
    expect(refusal(() => parseRecordCsv(recordCsv(wave))).code).toBe('missing-sample-rate')
  })

  it('refuses an invalid option with a RangeError naming it', () => {
    expect(() => parseRecordCsv(good, { samplingTolerance: -1 })).toThrow(
      'samplingTolerance must be a positive finite number, got -1',
    )
  })
})

describe('decodeRecordBytes', () => {
  const utf8 = new TextEncoder().encode(good)

  it('decodes UTF-8 and drops a UTF-8 byte-order mark', () => {
    const withBom = new Uint8Array([0xef, 0xbb, 0xbf, ...utf8])
    expect(parseRecordBytes(withBom).acceleration.length).toBe(100)
  })

  it('refuses UTF-16 text by its byte-order mark, and by its NUL bytes without one', () => {
    const utf16 = new Uint8Array([0xff, 0xfe, ...[...good].flatMap((c) => [c.charCodeAt(0), 0])])
    const bom = refusal(() => decodeRecordBytes(utf16))
    expect(bom.code).toBe('encoding')
    expect(bom.message).toMatch(/^line 1: the file is UTF-16 encoded/)
    const e = refusal(() => decodeRecordBytes(utf16.slice(2)))
    expect(e.message).toMatch(/^line 1: NUL byte: the file looks UTF-16 encoded or binary/)
  })

  it('names the line of bytes that are not UTF-8 (a Latin-1 header)', () => {
    const latin1 = new Uint8Array([
      ...new TextEncoder().encode('# sensor\n'),
      0x61,
      0xb5,
      0x0a,
      ...utf8,
    ])
    const e = refusal(() => parseRecordBytes(latin1))
    expect(e.message).toMatch(/^line 2: bytes that are not valid UTF-8/)
  })

  it('refuses text that a lenient decoder already marked with replacement characters', () => {
    const e = refusal(() => parseRecordCsv(good.replace('time_s', 'time_\uFFFD')))
    expect(e.message).toMatch(/^line 1: bytes that are not valid UTF-8/)
  })
})
