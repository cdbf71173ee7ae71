import { describe, expect, it } from 'vitest'
import { readNumber } from '../../shared/number-text'
import { readMoney } from '../../shared/money'

// Decimal and grouping marks as written in English and in most of continental Europe
// (ISO 80000-1 §7.3.1 allows the point or the comma as the decimal sign and a space to group
// digits in threes; the point-as-decimal, comma-as-grouping habit is English common practice).
function read(text: string) {
  const r = readNumber(text)
  if (!r.ok) throw new Error(r.message)
  return r
}

describe('reading the number a person typed', () => {
  it('takes a lone comma as the decimal mark', () => {
    expect(read('6,3').value).toBe(6.3)
    expect(read('12,5').value).toBe(12.5)
    expect(read('0,05').value).toBe(0.05)
    expect(read(',5').value).toBe(0.5)
  })

  it('takes the last of a point and a comma as the decimal mark and the other as grouping', () => {
    expect(read('1,234.5').value).toBe(1234.5)
    expect(read('1.234,5').value).toBe(1234.5)
    expect(read('1,234,567').value).toBe(1234567)
    expect(read('12 000').value).toBe(12000)
    expect(read("12'000,25").value).toBe(12000.25)
  })

  it('hands back the unit after the number and keeps exponents and signs', () => {
    expect(read('6,3 Hz')).toMatchObject({ value: 6.3, number: '6.3', rest: 'Hz' })
    expect(read('3.5e+7 N/m')).toMatchObject({ value: 3.5e7, rest: 'N/m' })
    expect(read('−2,5 kN')).toMatchObject({ value: -2.5, rest: 'kN' })
    expect(read('12 000 kg')).toMatchObject({ value: 12000, rest: 'kg' })
    expect(read('5 %')).toMatchObject({ value: 5, rest: '%' })
  })

  it('refuses a comma that could mean a thousand or a decimal, and says how to type it', () => {
    const r = readNumber('1,500')
    expect(r.ok).toBe(false)
    if (!r.ok) expect(r.message).toContain('1500 or 1.500')
    expect(read('0,500').value).toBe(0.5)
    expect(read('1,5').value).toBe(1.5)
  })

  it('refuses badly grouped digits, two decimal marks and text without a number', () => {
    expect(readNumber('1 23').ok).toBe(false)
    expect(readNumber('1.2.3').ok).toBe(false)
    expect(readNumber('heavy').ok).toBe(false)
    expect(readNumber('   ')).toEqual({ ok: false, message: 'required' })
  })
})

describe('reading a typed amount of money', () => {
  it('reads a decimal comma in a price, never ten times the amount', () => {
    expect(readMoney('12,5', 'EUR')).toEqual({ ok: true, minor: 1250 })
    expect(readMoney('€ 1 234,50', 'EUR')).toEqual({ ok: true, minor: 123450 })
    expect(readMoney('99 £', 'GBP')).toEqual({ ok: true, minor: 9900 })
  })

  it('refuses a third decimal and another currency', () => {
    expect(readMoney('12,345', 'EUR').ok).toBe(false)
    expect(readMoney('1.005', 'EUR')).toEqual({
      ok: false,
      message: 'at most two decimals (whole cents)',
    })
    expect(readMoney('£12', 'EUR')).toEqual({
      ok: false,
      message: 'this amount is in EUR, not GBP',
    })
  })
})
