import { setRows } from '../../../../shared/sizing/set-rows'
import { formatBasisPoints, formatMoney } from '../../../../shared/money'
import type { CustomerQuote as Quote } from '../../../../shared/schemas/quote'
import { esc, sig } from '../../../integrations/pdf/html'
import { responseChartSvg } from './response-chart'
import { QUOTE_CSS } from './quote-styles'
import {
  ACKNOWLEDGEMENT_CSS,
  acknowledgementHtml,
} from '../../../integrations/pdf/acknowledgement-html'

/** The engineering caution printed on every quote. */
export const QUOTE_CAUTION =
  'Design aid only. The sizing in this quote supports, and does not replace, the design of a ' +
  'licensed engineer: the final design, the anchorage of the absorber mass and its fall ' +
  'restraint are for a licensed engineer under the local codes.'

export interface Supplier {
  name: string
  address: string
}

const UNIT = { displacement: 'm', velocity: 'm/s', acceleration: 'm/s²' } as const

function sizingSection(q: Quote) {
  const s = q.sizing
  const a = s.absorber
  const rows: [string, string][] = [
    ['Sizing', `${s.title} (no. ${s.id}, rev ${s.revision})`],
    [
      'Host mode',
      `mode ${s.targetMode} at ${sig(s.hostFrequencyHz)} Hz, modal mass ${sig(s.effectiveMass)} kg`,
    ],
    ['Absorber mass', `${sig(a.mass)} kg (mass ratio ${sig((a.mass / s.effectiveMass) * 100)} %)`],
    ['Absorber tuning', `${sig(a.frequencyHz)} Hz, frequency ratio ${sig(a.frequencyRatio)}`],
    ['Damping ratio', sig(a.dampingRatio)],
    ['Spring rate / damper', `${sig(a.stiffness)} N/m / ${sig(a.damping)} N·s/m`],
    ...setRows(s),
    ...(s.load ? [['Design load', s.load] as [string, string]] : []),
    [
      'Stroke at design load',
      `${sig(s.stroke * 1000)} mm${s.strokeLimit ? ` (limit ${sig(s.strokeLimit * 1000)} mm)` : ''}`,
    ],
    ...(s.orientation === 'vertical'
      ? [['Static deflection', `${sig(s.staticDeflection * 1000)} mm`] as [string, string]]
      : []),
    [
      'Expected reduction',
      s.reduction === null ? 'not bounded (undamped host)' : `${sig(s.reduction)} ×`,
    ],
    [
      'Acceptance',
      `${s.acceptance.label}: ${sig(s.acceptance.responseWith)} ${UNIT[s.acceptance.quantity]} peak ${s.acceptance.quantity} against a limit of ${sig(s.acceptance.limit)} ${UNIT[s.acceptance.quantity]} — ${s.acceptance.passes ? 'meets the limit' : 'does NOT meet the limit'}`,
    ],
  ]
  const body = rows.map(([k, v]) => `<tr><td>${esc(k)}</td><td>${esc(v)}</td></tr>`).join('')
  return `<h2>Sizing summary</h2><table class="kv">${body}</table>
<div class="chart">${responseChartSvg(s.chart)}</div>`
}

/** The priced lines and the totals of a quote; the receipt prints them too. */
export function linesSection(q: Quote, title = 'Prices') {
  const m = (v: number) => esc(formatMoney(v, q.currency))
  const rows = q.lines
    .map(
      (l) =>
        `<tr><td>${l.position}</td><td>${esc(l.code)}</td><td>${esc(l.description)}</td><td class="num">${l.quantity}</td><td class="num">${m(l.unitPrice)}</td><td class="num">${m(l.lineTotal)}</td></tr>`,
    )
    .join('')
  const discount = q.discountBp
    ? `<tr><td>Discount ${esc(formatBasisPoints(q.discountBp))}</td><td class="num">−${m(q.discount)}</td></tr>
<tr><td>After discount</td><td class="num">${m(q.discountedSubtotal)}</td></tr>`
    : ''
  return `<h2>${esc(title)}</h2><table><thead><tr><th>#</th><th>Code</th><th>Item</th><th class="num">Qty</th><th class="num">Unit price</th><th class="num">Amount</th></tr></thead><tbody>${rows}</tbody></table>
<table class="totals"><tr><td>Subtotal</td><td class="num">${m(q.subtotal)}</td></tr>${discount}
<tr><td>Tax${q.taxRateName ? ` (${esc(q.taxRateName)})` : ''} ${esc(formatBasisPoints(q.taxBp))}</td><td class="num">${m(q.tax)}</td></tr>
<tr class="grand"><td>Total (${esc(q.currency)})</td><td class="num">${m(q.total)}</td></tr></table>`
}

/**
 * The whole quote as one self-contained HTML page: inline styles, fonts and chart, nothing
 * fetched.
 * @param fontCss @font-face rules with data: URIs
 */
export function quoteHtml(q: Quote, supplier: Supplier, fontCss: string): string {
  const issued = (q.sentAt ?? q.createdAt).slice(0, 10)
  return `<!doctype html><html lang="en-GB"><head><meta charset="utf-8"><title>${esc(q.reference)}</title>
<style>${fontCss}${QUOTE_CSS}${ACKNOWLEDGEMENT_CSS}</style></head><body>
<div class="head"><div><div class="supplier">${esc(supplier.name)}</div><div class="muted">${esc(supplier.address)}</div></div>
<div style="text-align:right"><h1>Quotation</h1><div><strong>${esc(q.reference)}</strong></div><div class="muted">Issued ${esc(issued)}</div><div>Valid until <strong>${esc(q.validUntil)}</strong></div></div></div>
<div class="cols"><div><h2>Customer</h2><div><strong>${esc(q.companyName)}</strong></div>
${q.contactName ? `<div>${esc(q.contactName)}</div><div class="muted">${esc(q.contactEmail)}</div>` : ''}</div>
<div><h2>Site</h2><div>${esc(q.siteName)}</div></div></div>
${sizingSection(q)}
${acknowledgementHtml(q.sizing.designAcknowledgement, { names: false })}
${linesSection(q)}
<h2>Validity and terms</h2><p>This quotation is valid until ${esc(q.validUntil)}.</p>
<div class="terms">${esc(q.terms)}</div>
<div class="caution"><strong>Engineering caution.</strong> ${esc(QUOTE_CAUTION)}</div>
</body></html>`
}

/** Page numbers at the foot of every page (Chromium fills the spans). */
export function quoteFooter(reference: string) {
  return `<div style="font-size:8px;width:100%;padding:0 14mm;color:#555;display:flex;justify-content:space-between"><span>${esc(reference)}</span><span>page <span class="pageNumber"></span> of <span class="totalPages"></span></span></div>`
}
