import express, { Router, type NextFunction, type Request, type Response } from 'express'
import { expireSession, loadSession } from './actions'
import { apiErrorHandler, requireSecretKey } from './api-errors'
import type { FakeContext } from './context'
import { parseSessionParams } from './session-params'
import { createSession } from './store'
import { listEvents } from './event-list'
import { createRefund } from './refunds'
import { FakeApiError } from './types'

/**
 * Replays the first answer to a POST with the same Idempotency-Key, so a client retry never
 * creates a second session.
 */
function idempotency(ctx: FakeContext) {
  return (req: Request, res: Response, next: NextFunction): void => {
    const key = req.get('idempotency-key')
    if (req.method !== 'POST' || !key) return next()
    const seen = ctx.store.idempotent.get(`${req.path} ${key}`)
    if (seen) {
      res.status(seen.status).set('Idempotent-Replayed', 'true').json(seen.body)
      return
    }
    const json = res.json.bind(res)
    res.json = (body: unknown) => {
      if (res.statusCode < 500)
        ctx.store.idempotent.set(`${req.path} ${key}`, { status: res.statusCode, body })
      return json(body)
    }
    next()
  }
}

/** The `/v1` API: Checkout Sessions, events and refunds, the calls the app makes. */
export function apiRouter(ctx: FakeContext): Router {
  const router = Router()
  router.use(requireSecretKey(ctx))
  router.use(express.urlencoded({ extended: true }))
  router.use(idempotency(ctx))

  router.post('/checkout/sessions', (req, res) => {
    const params = parseSessionParams(req.body ?? {}, ctx.nowS())
    res.json(createSession(ctx.store, params, ctx.options.publicUrl, ctx.nowS()))
  })
  router.get('/checkout/sessions/:id', async (req, res) => {
    res.json((await loadSession(ctx, req.params.id)).session)
  })
  router.post('/checkout/sessions/:id/expire', async (req, res) => {
    res.json(await expireSession(ctx, req.params.id))
  })
  router.get('/events', (req, res) => {
    res.json(listEvents(ctx, req.query as Record<string, unknown>))
  })
  router.get('/events/:id', (req, res) => {
    const found = ctx.store.events.find((e) => e.event.id === req.params.id)
    if (!found)
      throw new FakeApiError(
        404,
        'invalid_request_error',
        `No such event: '${req.params.id}'`,
        'id',
      )
    res.json(found.event)
  })
  router.post('/refunds', async (req, res) => {
    res.json(await createRefund(ctx, (req.body ?? {}) as Record<string, unknown>))
  })
  router.use((req) => {
    throw new FakeApiError(
      404,
      'invalid_request_error',
      `Unrecognized request URL (${req.method}: ${req.originalUrl}). The payments fake implements Checkout Sessions, events and refunds only.`,
    )
  })
  router.use(apiErrorHandler)
  return router
}
