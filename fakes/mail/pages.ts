import { escapeHtml, htmlDocument } from '../shared/html'
import type { CaughtMessage } from './types'

/** Its own look: a ledger of dark ink on pale green paper, monospace dates. */
const CSS = `
body{margin:0;font:15px/1.5 system-ui,sans-serif;background:#eef3ee;color:#15231b}
header{background:#15231b;color:#eef3ee;padding:.75rem 1.25rem}
header a{color:#eef3ee}h1{font-size:1.1rem;margin:0}
main{padding:1rem 1.25rem;max-width:64rem}
table{border-collapse:collapse;width:100%;background:#fff}
th,td{text-align:left;padding:.45rem .6rem;border-bottom:1px solid #c9d6cb;vertical-align:top}
th{background:#dce7dd;font-weight:600}
time{font-family:ui-monospace,monospace;font-size:.9em}
a{color:#135c3a}a:focus{outline:3px solid #d98e04;outline-offset:1px}
pre{white-space:pre-wrap;background:#fff;border:1px solid #c9d6cb;padding:.75rem}
iframe{width:100%;height:28rem;border:1px solid #c9d6cb;background:#fff}
dl{display:grid;grid-template-columns:max-content 1fr;gap:.2rem 1rem}dt{font-weight:600}
.empty{padding:2rem;background:#fff;text-align:center}`

function frame(title: string, main: string): string {
  const header = `<header><h1><a href="/">Quellnode mail catcher</a></h1></header>`
  return htmlDocument(title, CSS, `${header}\n<main>${main}</main>`)
}

const time = (iso: string): string =>
  `<time datetime="${escapeHtml(iso)}">${escapeHtml(iso.replace('T', ' ').slice(0, 19))}</time>`

/** The inbox: newest first, one row per message. */
export function renderInbox(messages: CaughtMessage[]): string {
  if (messages.length === 0) {
    return frame('Mail catcher: inbox', '<p class="empty">No messages caught yet.</p>')
  }
  const rows = messages.map(
    (m) => `<tr><td><a href="/messages/${m.id}">${escapeHtml(m.subject || '(no subject)')}</a></td>
<td>${escapeHtml(m.to.join(', '))}</td><td>${time(m.date)}</td><td>${m.attachments.length}</td></tr>`,
  )
  const table = `<table><caption>${messages.length} caught message(s), newest first</caption>
<thead><tr><th scope="col">Subject</th><th scope="col">To</th><th scope="col">Date</th><th scope="col">Attachments</th></tr></thead>
<tbody>${rows.join('\n')}</tbody></table>`
  return frame('Mail catcher: inbox', table)
}

function attachmentList(m: CaughtMessage): string {
  if (m.attachments.length === 0) return '<p>No attachments.</p>'
  const items = m.attachments.map(
    (a, i) =>
      `<li><a href="/messages/${m.id}/attachments/${i}" download>${escapeHtml(a.filename ?? `attachment-${i}`)}</a> (${escapeHtml(a.contentType)}, ${a.size} bytes)</li>`,
  )
  return `<ul>${items.join('')}</ul>`
}

/** One message: headers, the text part, the HTML part sandboxed, attachments to download. */
export function renderMessage(m: CaughtMessage): string {
  const meta = `<dl><dt>From</dt><dd>${escapeHtml(m.from)}</dd><dt>To</dt><dd>${escapeHtml(m.to.join(', '))}</dd>
<dt>Delivered to</dt><dd>${escapeHtml(m.envelope.to.join(', '))}</dd><dt>Date</dt><dd>${time(m.date)}</dd></dl>`
  const text = m.text ? `<h3>Text</h3><pre>${escapeHtml(m.text)}</pre>` : ''
  // No allow-* tokens: the mail's HTML can neither run script nor navigate this page.
  const html = m.html
    ? `<h3>HTML</h3><iframe sandbox src="/messages/${m.id}/html" title="HTML body of the message"></iframe>`
    : ''
  const main = `<h2>${escapeHtml(m.subject || '(no subject)')}</h2>${meta}${text}${html}
<h3>Attachments</h3>${attachmentList(m)}`
  return frame(`Mail catcher: ${m.subject}`, main)
}

export function renderNotFound(id: string): string {
  return frame('Mail catcher: not found', `<p>No message with id ${escapeHtml(id)}.</p>`)
}
