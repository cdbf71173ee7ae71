import type { FakeContext } from './context'
import { newId } from './ids'
import { stringMap } from './session-params'
import { FakeApiError, type Refund, type SessionRecord } from './types'
import { emit } from './webhooks'

type Body = Record<string, unknown>

const REASONS = ['duplicate', 'fraudulent', 'requested_by_customer']

const invalid = (param: string, message: string, code?: string) =>
  new FakeApiError(400, 'invalid_request_error', message, param, code)

function paidSession(ctx: FakeContext, paymentIntent: unknown): SessionRecord {
  if (typeof paymentIntent !== 'string' || paymentIntent === '')
    throw invalid('payment_intent', 'Missing required param: payment_intent.')
  for (const record of ctx.store.sessions.values()) {
    const s = record.session
    if (s.payment_intent === paymentIntent && s.payment_status === 'paid') return record
  }
  throw new FakeApiError(
    404,
    'invalid_request_error',
    `No such payment_intent: '${paymentIntent}'`,
    'payment_intent',
    'resource_missing',
  )
}

function amountOf(body: Body, left: number): number {
  if (body.amount === undefined) return left
  const n = typeof body.amount === 'string' && /^[0-9]{1,12}$/.test(body.amount) ? +body.amount : 0
  if (n < 1) throw invalid('amount', 'Invalid amount: must be a positive integer.')
  if (n > left)
    throw invalid('amount', `Refund amount (${n}) is greater than unrefunded amount (${left}).`)
  return n
}

/**
 * POST /v1/refunds against a paid session's payment intent (the whole unrefunded amount unless
 * `amount` says less). Sends `refund.created` and `charge.refunded`.
 */
export async function createRefund(ctx: FakeContext, body: Body): Promise<Refund> {
  const record = paidSession(ctx, body.payment_intent)
  const s = record.session
  const left = s.amount_total - record.refunded
  if (left <= 0)
    throw invalid('charge', 'Charge has already been refunded.', 'charge_already_refunded')
  const amount = amountOf(body, left)
  const reason = body.reason === undefined ? null : String(body.reason)
  if (reason !== null && !REASONS.includes(reason))
    throw invalid('reason', `Invalid reason: must be one of ${REASONS.join(', ')}.`)
  record.refunded += amount
  const charge = `ch_${(s.payment_intent ?? '').slice(3)}`
  const refund: Refund = {
    id: newId('re'),
    object: 'refund',
    amount,
    currency: s.currency,
    payment_intent: s.payment_intent ?? '',
    charge,
    status: 'succeeded',
    reason,
    metadata: stringMap(body.metadata, 'metadata'),
    created: ctx.nowS(),
  }
  ctx.store.refunds.push(refund)
  await emit(ctx, 'refund.created', { ...refund }, s.id)
  await emit(
    ctx,
    'charge.refunded',
    {
      id: charge,
      object: 'charge',
      amount: s.amount_total,
      amount_refunded: record.refunded,
      currency: s.currency,
      payment_intent: s.payment_intent,
      refunded: record.refunded >= s.amount_total,
      status: 'succeeded',
    },
    s.id,
  )
  return refund
}
