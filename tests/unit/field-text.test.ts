import { describe, expect, it } from 'vitest'
import { fieldText, readField, type FieldSpec } from '../../shared/field-text'

function ok(text: string, spec: FieldSpec) {
  const r = readField(text, spec)
  if (!r.ok) throw new Error(r.message)
  return r
}

describe('the text of a numeric field and the value it stands for', () => {
  it('says what it understood beside the field', () => {
    expect(ok('6,3 Hz', { kind: 'frequency' }).understood).toBe('= 6.3 Hz')
    expect(ok('5', { kind: 'percent' }).understood).toBe('= 5 %')
    expect(ok('0,05', { kind: 'percent' }).understood).toBe('= 0.05 %')
    expect(ok('12,5', { kind: 'money', currency: 'EUR' }).understood).toBe('= €12.50')
    // 1500 rpm = 1500 · 2π/60 rad/s = 157.0796… rad/s (definition of the revolution)
    expect(ok('1500 rpm', { kind: 'speed' }).understood).toBe('= 1500 rpm (157.08 rad/s)')
    expect(ok('25 Hz', { kind: 'speed' }).understood).toBe('= 1500 rpm (157.08 rad/s)')
  })

  it('warns outside the plausible range and still keeps the value as typed', () => {
    const r = ok('60 %', { kind: 'percent', range: [0.001, 0.5] })
    expect(r.value).toBeCloseTo(0.6, 15)
    expect(r.warning).toBe('unusual: the plausible range is 0.1 % to 50 %; check the value')
    expect(ok('2 %', { kind: 'percent', range: [0.001, 0.5] }).warning).toBe('')
    expect(ok('5000 Hz', { kind: 'frequency' }).warning).toContain('plausible range')
  })

  it('writes a value back as text that reads to the same number', () => {
    const cases: [number, FieldSpec][] = [
      [1234.56789, { kind: 'mass' }],
      [0.02345, { kind: 'percent' }],
      [3.5e7, { kind: 'stiffness' }],
      [1.23456789e-5, { kind: 'displacement' }],
      [0.9524, { kind: 'number' }],
      [1250, { kind: 'money', currency: 'EUR' }],
      [7, { kind: 'count' }],
      [(1480 * 2 * Math.PI) / 60, { kind: 'speed' }],
    ]
    for (const [v, spec] of cases) expect(ok(fieldText(v, spec), spec).value).toBeCloseTo(v, 12)
    expect(fieldText(1250, { kind: 'money' })).toBe('12.50')
    expect(fieldText(0.05, { kind: 'percent' })).toBe('5 %')
    // a speed is written back in rpm, as machines are rated: 1480 rpm stays "1480 rpm"
    expect(fieldText((1480 * 2 * Math.PI) / 60, { kind: 'speed' })).toBe('1480 rpm')
  })

  it('passes on the reason a text cannot be read', () => {
    expect(readField('5 kg', { kind: 'frequency' })).toEqual({
      ok: false,
      message: '"kg" is not a unit of frequency (e.g. Hz)',
    })
  })
})
