import { escapeHtml, htmlDocument } from '../shared/html'
import { successRedirect, TEST_CARDS } from './actions'
import { formatMinor } from './money'
import type { SessionRecord } from './types'

/** A plain look of its own: slate on off-white, one teal accent, system fonts. */
const CSS = `
body{margin:0;font:16px/1.5 system-ui,sans-serif;background:#f4f3ef;color:#1f2a30}
main{max-width:30rem;margin:2rem auto;padding:1.5rem;background:#fff;border:2px solid #1f2a30}
h1{font-size:1.25rem;margin:0 0 .25rem}
.note{font-size:.875rem;color:#4a5860}
.sum{font-size:2rem;font-weight:700;margin:.5rem 0 1rem}
table{border-collapse:collapse;width:100%;margin-bottom:1rem;font-size:.9rem}
td{padding:.25rem 0;border-bottom:1px solid #d8d6cf}td:last-child{text-align:right}
label{display:block;font-weight:600;margin-top:1rem}
input{font:inherit;width:100%;box-sizing:border-box;padding:.6rem;border:2px solid #4a5860}
input:focus,button:focus{outline:3px solid #0f7d78;outline-offset:2px}
.actions{display:flex;gap:.75rem;margin-top:1rem}
button{font:inherit;font-weight:600;padding:.6rem 1.2rem;border:2px solid #1f2a30;cursor:pointer}
.go{background:#0f7d78;color:#fff;border-color:#0f7d78}.back{background:#fff;color:#1f2a30}
.alert{border-left:6px solid #a4161a;background:#fbeaea;padding:.5rem .75rem;margin:1rem 0}
code{font-size:.95em}`

function lines(record: SessionRecord): string {
  const rows = record.lineItems.map(
    (li) =>
      `<tr><td>${escapeHtml(li.name)} × ${li.quantity}</td><td>${escapeHtml(
        formatMinor(li.unitAmount * li.quantity, li.currency),
      )}</td></tr>`,
  )
  return `<table aria-label="What you are paying for"><tbody>${rows.join('')}</tbody></table>`
}

/** A closed request says so and leads back to the shop: where a payment lands, or its exit. */
function closedBody(record: SessionRecord): string {
  const paid = record.session.status === 'complete'
  const word = paid ? 'has been paid' : 'has expired'
  const back = paid ? successRedirect(record.session) : record.session.cancel_url
  const link = back ? `<p><a href="${escapeHtml(back)}">Back to the shop</a></p>` : ''
  return `<main><h1>Test payment desk</h1><p role="status">This payment request ${word}. Nothing more to do here.</p>${link}</main>`
}

/**
 * The fake's own hosted pay page. Test numbers are printed on it, because nobody should have
 * to look them up to try a payment locally.
 * @param message shown in an alert region after a declined or unknown card
 */
export function renderPayPage(record: SessionRecord, message?: string): string {
  const { session } = record
  if (session.status !== 'open') return htmlDocument('Test payment desk', CSS, closedBody(record))
  const total = formatMinor(session.amount_total, session.currency)
  const alert = message ? `<p class="alert" role="alert">${escapeHtml(message)}</p>` : ''
  const body = `<main>
<h1>Test payment desk</h1>
<p class="note">A local stand-in for the payment service: no money moves.</p>
<p class="sum" aria-label="Amount due: ${escapeHtml(total)}">${escapeHtml(total)}</p>
<p class="note">Currency: ${escapeHtml(session.currency.toUpperCase())}</p>
${lines(record)}
${alert}
<form method="post" action="/pay/${escapeHtml(session.id)}">
<label for="card">Card number</label>
<input id="card" name="card" inputmode="numeric" autocomplete="cc-number" required aria-describedby="cards">
<div id="cards" class="note"><p>Test numbers:</p><ul>
<li><code>4242 4242 4242 4242</code> — payment goes through</li>
<li><code>4000 0000 0000 0002</code> — payment is declined</li>
</ul></div>
<div class="actions">
<button class="go" type="submit" name="action" value="pay" aria-label="Pay ${escapeHtml(total)}">Pay</button>
<button class="back" type="submit" name="action" value="cancel" formnovalidate aria-label="Cancel and go back without paying">Cancel</button>
</div>
</form>
</main>`
  return htmlDocument(`Pay ${total} — test payment desk`, CSS, body)
}

export const DECLINED_MESSAGE = 'The card was declined. Try another card or cancel.'
export const UNKNOWN_CARD_MESSAGE = `Use one of the test numbers: ${TEST_CARDS.succeeds.replace(/(\d{4})(?=\d)/g, '$1 ')} or ${TEST_CARDS.declined.replace(/(\d{4})(?=\d)/g, '$1 ')}.`
