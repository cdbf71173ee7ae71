import { describe, expect, it } from 'vitest'
import { plainSummary, responseText } from '../../shared/quote-plain-words'
import type { CustomerSizing } from '../../shared/schemas/quote'
import {
  OFFICE_FLOOR,
  OFFICE_FLOOR_ABSORBER,
  OFFICE_FLOOR_ACCEPTANCE,
} from '../helpers/office-floor'

// The invented office floor (demo data): mode 1 at 6.9 Hz, a 212.4 kg vertical absorber.
const floor: CustomerSizing = {
  id: 1,
  revision: 1,
  title: 'Level 3 office floor',
  state: 'submitted',
  siteName: 'Harbour Row offices',
  companyName: 'Customer Ltd',
  targetMode: 1,
  ...OFFICE_FLOOR,
  absorber: OFFICE_FLOOR_ABSORBER,
  staticDeflection: 0.00545,
  acceptance: OFFICE_FLOOR_ACCEPTANCE,
  chart: { frequencyHz: [], without: [], with: [] },
}

describe('the plain-words summary of a quote', () => {
  it('says what the unit does, before and after in numbers, and that the limit is met', () => {
    const p = plainSummary(floor, 220)
    expect(p.purpose).toBe(
      'The unit reduces the vertical (up-and-down) vibration of “Level 3 office floor” at Harbour Row offices, which is strongest at 6.9 Hz.',
    )
    // before = after × reduction = 0.03 × 6.2 = 0.186 m/s²; 1 − 1/6.2 = 0.839 → 84 % (by hand)
    expect(p.reduction).toBe(
      'At the design load the peak vertical acceleration drops from 0.186 m/s² to 0.03 m/s²: about 6.2 times less (84 % lower).',
    )
    expect(p.limit).toEqual({
      passes: true,
      text: 'This is within the agreed limit of 0.05 m/s² (Office floor).',
    })
    expect(p.travel.text).toBe(
      "At the design load the absorber's mass swings up to 9 mm either way, within the 20 mm the unit allows.",
    )
    expect(p.weight).toMatch(/^Its moving mass weighs 220 kg;/)
    expect(p.caution).toMatch(/licensed structural engineer.*local building codes/)
  })

  it('explains a limit that is not met and a travel beyond the unit in words, with how far off they are', () => {
    const p = plainSummary({
      ...floor,
      stroke: 0.025,
      acceptance: { ...floor.acceptance, limit: 0.02, passes: false },
    })
    // 0.03 / 0.02 − 1 = 50 % over (by hand)
    expect(p.limit.passes).toBe(false)
    expect(p.limit.text).toMatch(
      /^This is still above the agreed limit of 0.02 m\/s² \(Office floor\), by about 50 %\. The absorber lowers the acceleration, but not as far as the limit asks/,
    )
    expect(p.travel).toEqual({
      passes: false,
      text: "At the design load the absorber's mass swings up to 25 mm either way, more than the 20 mm the unit allows: under the full design load it could strike its end stops, which makes it less effective and wears the unit.",
    })
    // without a built mass the designed one is given
    expect(p.weight).toMatch(/weighs 212 kg/)
  })

  it('tells an undamped host without a ratio, and reads each quantity in its usual unit', () => {
    expect(plainSummary({ ...floor, reduction: null }).reduction).toMatch(
      /no damping of its own.*stays at 0\.03 m\/s²\.$/,
    )
    expect(responseText(0.0012, 'displacement')).toBe('1.2 mm')
    expect(responseText(0.0045, 'velocity')).toBe('4.5 mm/s')
    expect(responseText(0.05, 'acceleration')).toBe('0.05 m/s²')
  })
})
