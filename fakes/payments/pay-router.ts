import express, { Router, type NextFunction, type Request, type Response } from 'express'
import { escapeHtml, htmlDocument } from '../shared/html'
import { loadSession, paySession, successRedirect } from './actions'
import type { FakeContext } from './context'
import { DECLINED_MESSAGE, renderPayPage, UNKNOWN_CARD_MESSAGE } from './pay-page'
import { FakeApiError } from './types'

function pageError(err: unknown, _req: Request, res: Response, next: NextFunction): void {
  if (!(err instanceof FakeApiError)) return next(err)
  const title = err.status === 404 ? 'No such payment request' : 'Payment request not open'
  res
    .status(err.status)
    .type('html')
    .send(
      htmlDocument(
        title,
        'body{font:16px system-ui,sans-serif;margin:2rem}',
        `<main><h1>${title}</h1><p>${escapeHtml(err.message)}</p></main>`,
      ),
    )
}

/** The hosted pay page: GET shows it, POST settles the attempt or cancels. */
export function payRouter(ctx: FakeContext): Router {
  const router = Router()
  router.use(express.urlencoded({ extended: false }))

  router.get('/:id', async (req, res) => {
    const record = await loadSession(ctx, req.params.id)
    res.type('html').send(renderPayPage(record))
  })

  router.post('/:id', async (req, res) => {
    const record = await loadSession(ctx, req.params.id)
    const body = (req.body ?? {}) as Record<string, unknown>
    // The second press of a double-pressed Pay lands here after the first one paid: it goes
    // where the first one went, so the customer is not left on a dead end.
    if (record.session.status === 'complete') {
      res.redirect(303, successRedirect(record.session))
      return
    }
    if (record.session.status !== 'open') {
      res.status(409).type('html').send(renderPayPage(record))
      return
    }
    if (body.action === 'cancel') {
      const target = record.session.cancel_url
      if (target) res.redirect(303, target)
      else
        res.type('html').send(renderPayPage(record, 'Payment cancelled. You may close this page.'))
      return
    }
    const outcome = await paySession(ctx, record.session.id, String(body.card ?? ''))
    if (outcome === 'paid') {
      res.redirect(303, successRedirect(record.session))
      return
    }
    const [status, message] =
      outcome === 'declined' ? [402, DECLINED_MESSAGE] : [422, UNKNOWN_CARD_MESSAGE]
    res.status(status).type('html').send(renderPayPage(record, message))
  })

  router.use(pageError)
  return router
}
