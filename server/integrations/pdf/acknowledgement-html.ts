import type { DesignAcknowledgement } from '../../../shared/schemas/design-checks'
import { esc } from './html'

/** Print styles of the acknowledgement box, shared by the quote and the work order. */
export const ACKNOWLEDGEMENT_CSS = `
.ack{border:0.6mm solid #a4161a;background:#fdecea;padding:3mm 4mm;margin-top:5mm;page-break-inside:avoid}
.ack h2{color:#a4161a;border-bottom:none;margin:0 0 2mm}
.ack ul{margin:1mm 0 2mm;padding-left:5mm}
`

/**
 * The failed design checks a sizing was handed over with, the reason and when, for a printed
 * document; nothing when the design passed every check.
 * @param names print who acknowledged (staff documents) or leave it out (customer documents)
 */
export function acknowledgementHtml(
  ack: DesignAcknowledgement | null | undefined,
  opts: { names: boolean; confirmedBy?: { at: string; byName: string } | null },
): string {
  if (!ack) return ''
  const items = ack.failed
    .map((c) => `<li><strong>${esc(c.title)}.</strong> ${esc(c.message)}</li>`)
    .join('')
  const who = opts.names && ack.byName ? ` by ${esc(ack.byName)}` : ''
  const sales = opts.confirmedBy
    ? `<p>Confirmed by ${esc(opts.confirmedBy.byName)} (sales) on ${esc(opts.confirmedBy.at.slice(0, 10))} before sending.</p>`
    : ''
  return `<div class="ack"><h2>Design checks not met: accepted with a reason</h2>
<p>This design does not meet every check. It was handed over knowingly${who} on ${esc(ack.at.slice(0, 10))} (sizing rev ${ack.revision}):</p>
<ul>${items}</ul>
<p><strong>Reason given:</strong> ${esc(ack.reason)}</p>${sales}
<p>Have a licensed engineer review these points before the unit is built or installed.</p></div>`
}
