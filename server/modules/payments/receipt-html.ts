import { formatMoney } from '../../../shared/money'
import type { CustomerQuote } from '../../../shared/schemas/quote'
import { esc } from '../../integrations/pdf/html'
import { linesSection, type Supplier } from '../quotes/pdf/quote-html'
import { QUOTE_CSS } from '../quotes/pdf/quote-styles'

/** What a receipt states about the payment itself. */
export interface ReceiptPayment {
  /** "RCT-2026-0007" */
  receiptNumber: string
  orderNumber: string
  /** ISO time the payment was confirmed */
  paidAt: string
  /** minor units, as charged (in the quote's currency) */
  amount: number
  /** the payment service's reference of the charge */
  paymentReference: string
}

const RECEIPT_CSS = `
.paid{border:0.6mm solid #0f4c5c;background:#eef5f4;padding:3mm 4mm;margin-top:5mm;page-break-inside:avoid}
.paid .sum{font-size:14pt;font-weight:700}
`

/** The receipt of a paid order as one self-contained HTML page (inline styles and fonts). */
export function receiptHtml(
  q: CustomerQuote,
  p: ReceiptPayment,
  supplier: Supplier,
  fontCss: string,
): string {
  const paid = esc(formatMoney(p.amount, q.currency))
  const day = esc(p.paidAt.slice(0, 10))
  const buyer = q.acceptedName
    ? `<div>Accepted by ${esc(q.acceptedName)}${q.purchaseOrder ? `, purchase order ${esc(q.purchaseOrder)}` : ''}</div>`
    : ''
  return `<!doctype html><html lang="en-GB"><head><meta charset="utf-8"><title>${esc(p.receiptNumber)}</title>
<style>${fontCss}${QUOTE_CSS}${RECEIPT_CSS}</style></head><body>
<div class="head"><div><div class="supplier">${esc(supplier.name)}</div><div class="muted">${esc(supplier.address)}</div></div>
<div style="text-align:right"><h1>Receipt</h1><div><strong>${esc(p.receiptNumber)}</strong></div><div>Paid ${day}</div>
<div class="muted">Order ${esc(p.orderNumber)} · quote ${esc(q.reference)}</div></div></div>
<div class="cols"><div><h2>Customer</h2><div><strong>${esc(q.companyName)}</strong></div>${buyer}</div>
<div><h2>Site</h2><div>${esc(q.siteName)}</div></div></div>
${linesSection(q, 'What was paid for')}
<div class="paid"><div>Total paid</div><div class="sum">${paid}</div>
<div>Received on ${day} by card through our payment service, reference <strong>${esc(p.paymentReference)}</strong>.</div>
<div class="muted">Tax is included as shown above. Keep this receipt with your records.</div></div>
</body></html>`
}
