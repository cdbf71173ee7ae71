import express, { type Express, type Response } from 'express'
import { renderInbox, renderMessage, renderNotFound } from './pages'
import type { MailStore } from './store'
import { summarise } from './types'

/** Quotes a filename for Content-Disposition, with an RFC 5987 form for non-ASCII names. */
function disposition(filename: string): string {
  const ascii = filename.replace(/[^\x20-\x7e]|["\\]/g, '_')
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(filename)}`
}

/** The mailbox for people (HTML) and for tests (JSON under /api). */
export function createMailWeb(store: MailStore): Express {
  const app = express()
  app.disable('x-powered-by')
  const notFound = (res: Response, id: string) =>
    res.status(404).type('html').send(renderNotFound(id))

  app.get('/', (_req, res) => res.type('html').send(renderInbox(store.newestFirst())))
  app.get('/messages/:id', (req, res) => {
    const m = store.get(req.params.id)
    if (!m) return notFound(res, req.params.id)
    res.type('html').send(renderMessage(m))
  })
  app.get('/messages/:id/html', (req, res) => {
    const m = store.get(req.params.id)
    if (!m?.html) return notFound(res, req.params.id)
    // Also sandboxed when opened outside the iframe; images only inline, nothing fetched.
    res.set(
      'Content-Security-Policy',
      "sandbox; default-src 'none'; img-src data: cid:; style-src 'unsafe-inline'",
    )
    res.type('html').send(m.html)
  })
  app.get('/messages/:id/attachments/:index', (req, res) => {
    const a = store.get(req.params.id)?.attachments[Number(req.params.index)]
    if (!a) return notFound(res, `${req.params.id}/${req.params.index}`)
    res.set('Content-Disposition', disposition(a.filename ?? `attachment-${req.params.index}`))
    res.type(a.contentType).send(a.content)
  })

  app.get('/api/health', (_req, res) => res.json({ status: 'ok', messages: store.count() }))
  app.get('/api/messages', (_req, res) => res.json(store.newestFirst().map(summarise)))
  app.get('/api/messages/:id', (req, res) => {
    const m = store.get(req.params.id)
    if (!m)
      return res
        .status(404)
        .json({ error: { code: 'message-not-found', message: `No message ${req.params.id}` } })
    res.json(summarise(m))
  })
  app.delete('/api/messages', (_req, res) => {
    store.clear()
    res.status(204).end()
  })
  return app
}
