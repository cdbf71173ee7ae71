import { describe, expect, it } from 'vitest'
import { mount } from '@vue/test-utils'
import QuoteTotals from '../../src/components/QuoteTotals.vue'

const priced = {
  currency: 'EUR' as const,
  subtotal: 1_560_000,
  discount: 0,
  discountBp: 0,
  tax: 0,
  taxBp: 0,
  total: 1_560_000,
}

describe('the totals of a draft', () => {
  it('hold their rows before the first prices arrive, so the save button below does not jump', () => {
    const waiting = mount(QuoteTotals, { props: { totals: null, note: 'Updating the prices…' } })
    const rows = (w: { findAll: typeof waiting.findAll }) =>
      w.findAll('tr').map((r) => r.find('th').text())
    expect(rows(waiting)).toEqual(['Subtotal', 'Tax', 'Total'])
    expect(waiting.findAll('td').map((d) => d.text())).toEqual(['—', '—', '—'])
    expect(waiting.text()).toContain('Updating the prices…')
    // the same rows once priced (no discount): the table's height does not change
    const shown = mount(QuoteTotals, {
      props: { totals: priced, note: 'Prices from the catalogue' },
    })
    expect(rows(shown)).toEqual(['Subtotal', 'Tax 0 %', 'Total'])
    expect(shown.find('[data-test="quote-total"]').text()).toBe('€15,600.00')
  })
})
