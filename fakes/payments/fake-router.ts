import { Router, type Request } from 'express'
import { expireSession, failedIntent, loadSession } from './actions'
import { apiErrorHandler } from './api-errors'
import type { FakeContext } from './context'
import { ensurePaymentIntent, resetStore } from './store'
import { FakeApiError, type SentEvent } from './types'
import { deliver, recordEvent, runDueRetries } from './webhooks'

const SESSION_EVENT_TYPES = [
  'checkout.session.completed',
  'checkout.session.expired',
  'checkout.session.async_payment_succeeded',
  'checkout.session.async_payment_failed',
] as const
const DELIVERABLE = [...SESSION_EVENT_TYPES, 'payment_intent.payment_failed']

const query = (req: Request, name: string): string | undefined => {
  const value = req.query[name]
  return typeof value === 'string' && value !== '' ? value : undefined
}

const badParam = (param: string, message: string): FakeApiError =>
  new FakeApiError(400, 'invalid_request_error', message, param)

/** Picks the stored event to resend, which must belong to this session. */
function storedEvent(ctx: FakeContext, sessionId: string, eventId: string): SentEvent {
  const sent = ctx.store.events.find((e) => e.event.id === eventId && e.sessionId === sessionId)
  if (!sent)
    throw new FakeApiError(404, 'invalid_request_error', `No such event: '${eventId}'`, 'eventId')
  return sent
}

async function newEvent(ctx: FakeContext, sessionId: string, type: string): Promise<SentEvent> {
  if (!DELIVERABLE.includes(type)) {
    throw badParam('type', `Invalid type: must be one of ${DELIVERABLE.join(', ')}.`)
  }
  const record = await loadSession(ctx, sessionId)
  const object =
    type === 'payment_intent.payment_failed'
      ? failedIntent(record, ensurePaymentIntent(record))
      : { ...record.session }
  return recordEvent(ctx, type, object, sessionId)
}

/**
 * Helpers for tests, outside the real API and without a key: the fake listens on loopback
 * only. Deliver does not change the session; it sends what it is told, for replay and
 * out-of-order tests.
 */
export function fakeRouter(ctx: FakeContext): Router {
  const router = Router()

  router.get('/events', (req, res) => {
    const type = query(req, 'type')
    const sessionId = query(req, 'sessionId')
    const list = ctx.store.events.filter(
      (e) => (!type || e.event.type === type) && (!sessionId || e.sessionId === sessionId),
    )
    res.json({
      object: 'list',
      data: list.map(({ event, sessionId: sid, deliveries, nextRetryAt }) => ({
        ...event,
        session_id: sid,
        deliveries,
        next_retry_at: nextRetryAt,
      })),
    })
  })

  router.post('/sessions/:id/deliver', async (req, res) => {
    const eventId = query(req, 'eventId')
    const type = query(req, 'type')
    if (!eventId && !type)
      throw badParam('type', 'Give ?type= for a new event or ?eventId= to resend one.')
    const sent = eventId
      ? storedEvent(ctx, req.params.id, eventId)
      : await newEvent(ctx, req.params.id, type ?? '')
    const delivery = await deliver(ctx, sent)
    res.json({ event: sent.event, delivery })
  })

  router.post('/sessions/:id/expire', async (req, res) => {
    res.json(await expireSession(ctx, req.params.id))
  })

  router.post('/retries/run', async (_req, res) => {
    res.json({ delivered: await runDueRetries(ctx) })
  })

  router.post('/reset', (_req, res) => {
    resetStore(ctx.store)
    res.status(204).end()
  })

  router.use(apiErrorHandler)
  return router
}
