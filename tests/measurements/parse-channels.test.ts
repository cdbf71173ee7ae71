import { describe, expect, it } from 'vitest'
import { parseRecordCsv } from '../../shared/measurements/index'
import { refusal } from './helpers/refusal'

// Records with several acceleration channels and time columns in s or ms. The thresholds for
// the time unit (a step giving ≥ 10 Hz read as seconds is seconds, < 1 Hz is milliseconds,
// between the two the unit must be given) are common practice for structural records.
function table(header: string | null, step: number, columns: number, rows = 100): string {
  const lines = header === null ? [] : [header]
  for (let j = 0; j < rows; j++) {
    const values = Array.from({ length: columns }, (_, c) => Math.sin(j / (4 + c)).toFixed(5))
    lines.push([Number((j * step).toFixed(6)), ...values].join(','))
  }
  return lines.join('\n') + '\n'
}

describe('parseRecordCsv with several channels', () => {
  it('reads every column after the time column as a channel named by the header', () => {
    const r = parseRecordCsv(table('time_s,deck_a,deck_b,pier', 0.01, 3))
    expect(r.sampleRateHz).toBeCloseTo(100, 9)
    expect(r.channels.map((c) => [c.name, c.column])).toEqual([
      ['deck_a', 2],
      ['deck_b', 3],
      ['pier', 4],
    ])
    expect(r.channels[2]?.acceleration[9]).toBeCloseTo(Math.sin(9 / 6), 5)
    expect(r.acceleration).toBe(r.channels[0]?.acceleration)
    expect(r.timeUnit).toBe('s')
    expect(r.timeUnitSource).toBe('header')
    expect(r.warnings).toEqual([])
  })

  it('names channels by number without a header and picks the asked column as acceleration', () => {
    const r = parseRecordCsv(table(null, 0.01, 2), { accelerationColumn: 3 })
    expect(r.channels.map((c) => c.name)).toEqual(['channel 1', 'channel 2'])
    expect(r.acceleration).toBe(r.channels[1]?.acceleration)
  })

  it('reads every column as a channel when the sample rate is given', () => {
    const r = parseRecordCsv('0.1,0.2\n'.repeat(80), { sampleRateHz: 200 })
    expect(r.channels).toHaveLength(2)
    expect(r.timeUnit).toBeNull()
  })

  it('carries the node and direction of each channel given in the options', () => {
    const channels = [{ nodeId: 'm1', direction: '+z' as const }, { nodeId: 'm3' }]
    const r = parseRecordCsv(table('t,a,b,c', 0.01, 3), { channels })
    expect(r.channels.map((c) => [c.nodeId, c.direction])).toEqual([
      ['m1', '+z'],
      ['m3', null],
      [null, null],
    ])
  })

  it('refuses more channel mappings than channels and a direction it does not know', () => {
    const text = table('t,a', 0.01, 1)
    expect(() => parseRecordCsv(text, { channels: [{}, {}] })).toThrow(
      'channels: 2 mappings given, the record has 1 acceleration channel(s)',
    )
    const bad = [{ direction: 'up' }] as unknown as { direction: '+z' }[]
    expect(() => parseRecordCsv(text, { channels: bad })).toThrow(
      'channels[0].direction must be one of +x, -x, +y, -y, +z, -z',
    )
  })
})

describe('parseRecordCsv time unit', () => {
  it('detects a millisecond time column from its step and says so in a warning', () => {
    // 5 ms steps: read as seconds that would be 0.2 Hz sampling (the reported defect).
    const r = parseRecordCsv(table('time,acc', 5, 1))
    expect(r.timeUnit).toBe('ms')
    expect(r.timeUnitSource).toBe('step')
    expect(r.sampleRateHz).toBeCloseTo(200, 9)
    expect(r.warnings).toEqual([
      'the time column was read in milliseconds: in seconds its step of 5 would mean 0.2 Hz ' +
        'sampling; give the time unit if that is wrong',
    ])
  })

  it('takes the unit from the header and from the option', () => {
    const ms = parseRecordCsv(table('t [ms],acc', 2, 1))
    expect([ms.timeUnit, ms.timeUnitSource, ms.sampleRateHz]).toEqual(['ms', 'header', 500])
    const asked = parseRecordCsv(table('t,acc', 0.2, 1), { timeUnit: 'ms' })
    expect(asked.sampleRateHz).toBeCloseTo(5000, 6)
    expect(asked.startTimeS).toBe(0)
  })

  it('asks for the unit when the step fits both seconds and milliseconds', () => {
    const e = refusal(() => parseRecordCsv(table('t,acc', 0.2, 1)))
    expect(e.code).toBe('time-unit')
    expect(e.message).toBe(
      'line 2: the time step 0.2 is 5 Hz sampling in seconds or 5000 Hz in milliseconds: ' +
        'give the time unit (s or ms)',
    )
    expect(parseRecordCsv(table('t,acc', 0.2, 1), { timeUnit: 's' }).sampleRateHz).toBeCloseTo(5)
  })

  it('warns plainly about a sample rate no structural record uses', () => {
    const r = parseRecordCsv(table('time_s,acc', 5, 1))
    expect(r.sampleRateHz).toBeCloseTo(0.2, 9)
    expect(r.warnings).toEqual([
      'the sample rate is 0.2 Hz, unusually low: only modes below 0.1 Hz can be seen; ' +
        'check the unit of the time column (s or ms)',
    ])
    const given = parseRecordCsv('0.1\n'.repeat(80), { sampleRateHz: 2e6 })
    expect(given.warnings).toEqual(['the sample rate is 2000000 Hz, unusually high; check it'])
  })

  it('gives the time step in the unit read when the sampling is uneven', () => {
    const lines = table('time_ms,acc', 2, 1).split('\n')
    lines[40] = `77.5,0.1`
    expect(() => parseRecordCsv(lines.join('\n'))).toThrow(
      /^line 41: time step 1\.5 ms differs from the mean step 2 ms/,
    )
  })
})
