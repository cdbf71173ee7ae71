import { describe, expect, it } from 'vitest'
import { evaluate } from 'mathjs'
import { formatSi, parseQuantity } from '../../shared/units'

function value(text: string, kind: Parameters<typeof parseQuantity>[1]) {
  const p = parseQuantity(text, kind)
  if (!p.ok) throw new Error(p.message)
  return p.value
}

describe('typed quantities become SI numbers', () => {
  it('reads tonnes, kilonewtons per millimetre and hertz as mathjs converts them', () => {
    // Reference: mathjs evaluate with an explicit "to" conversion (npm mathjs 15).
    expect(value('2.5 t', 'mass')).toBeCloseTo(evaluate('2.5 tonne to kg').toNumber(), 9)
    expect(value('35 kN/mm', 'stiffness')).toBeCloseTo(3.5e7, 3)
    expect(value('4.2 Hz', 'frequency')).toBe(4.2)
    expect(value('120 kN s/m', 'damping')).toBeCloseTo(1.2e5, 6)
    expect(value('0.3 kN', 'force')).toBeCloseTo(300, 9)
    expect(value('12 mm/s', 'velocity')).toBeCloseTo(0.012, 12)
  })

  it('takes a bare number in the SI unit of the field', () => {
    expect(value('2500', 'mass')).toBe(2500)
    expect(value('2e6', 'stiffness')).toBe(2e6)
  })

  it('reads a percentage field the one way: a bare number is a percentage, stored as a fraction', () => {
    expect(value('1.5 %', 'percent')).toBeCloseTo(0.015, 15)
    expect(value('5', 'percent')).toBeCloseTo(0.05, 15)
    expect(value('5%', 'percent')).toBeCloseTo(0.05, 15)
    expect(value('0,05', 'percent')).toBeCloseTo(0.0005, 15)
    expect(value('2.6', 'percent')).toBeCloseTo(0.026, 15)
  })

  it('reads %g as a fraction of standard gravity', () => {
    // g = 9.80665 m/s² (CGPM 1901): 0.5 %g = 0.0490333 m/s²
    expect(value('0.5 %g', 'acceleration')).toBeCloseTo(0.0490333, 6)
  })

  it('reads rpm and Hz as a rotational speed in rad/s', () => {
    // 1 rpm = 2π/60 rad/s (definition)
    expect(value('1500 rpm', 'speed')).toBeCloseTo(157.0796, 4)
    expect(value('25 Hz', 'speed')).toBeCloseTo(157.0796, 4)
  })

  it('reads back its own display of a value', () => {
    for (const [v, kind] of [
      [0.049, 'acceleration'],
      [1.2e5, 'damping'],
      [3.5e7, 'stiffness'],
      [0.015, 'percent'],
      [6.3, 'frequency'],
    ] as const)
      expect(value(formatSi(v, kind), kind)).toBeCloseTo(v, 9)
  })

  it('reads a decimal comma as a point, never as a thousands separator', () => {
    expect(value('2,5 t', 'mass')).toBe(2500)
    expect(value('6,3 Hz', 'frequency')).toBe(6.3)
    expect(value('6,3', 'frequency')).toBe(6.3)
    expect(value('0,125 m', 'displacement')).toBe(0.125)
  })

  it('reads whole numbers in count fields and refuses fractions there', () => {
    expect(value('12', 'count')).toBe(12)
    expect(parseQuantity('2,5', 'count')).toEqual({ ok: false, message: 'a whole number' })
    expect(parseQuantity('3 kg', 'count').ok).toBe(false)
  })

  it('refuses a unit of the wrong kind and says which kind was expected', () => {
    const p = parseQuantity('35 kN', 'stiffness')
    expect(p.ok).toBe(false)
    if (!p.ok) expect(p.message).toContain('stiffness')
    expect(parseQuantity('1.5 %', 'mass').ok).toBe(false)
    expect(parseQuantity('3 kg', 'percent').ok).toBe(false)
  })

  it('refuses empty and unreadable text', () => {
    expect(parseQuantity('  ', 'mass')).toEqual({ ok: false, message: 'required' })
    expect(parseQuantity('heavy', 'mass').ok).toBe(false)
  })

  it('formats SI values with their unit and fractions in percent', () => {
    expect(formatSi(2500, 'mass')).toBe('2500 kg')
    expect(formatSi(3.5e7, 'stiffness')).toBe('3.5e+7 N/m')
    expect(formatSi(0.015, 'percent')).toBe('1.5 %')
  })
})
