import { z } from 'zod'
import {
  CheckoutAnswerSchema,
  OrderInfoSchema,
  QuoteOrderSchema,
  RefundInfoSchema,
} from '../../../shared/schemas/payment'
import { WebhookOutcomeSchema } from '../../../shared/schemas/service'
import express, { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import { PaymentReturnSchema } from '../../../shared/schemas/payment'
import type { ApiRegistry } from '../../http/api-registry'
import { route } from '../../http/route'
import type { PaymentsService } from './payments.service'

/** Mounted before the JSON parser: the signature is over the raw bytes. */
export function paymentsWebhookRouter(api: ApiRegistry, payments: PaymentsService) {
  const router = Router()
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/payments/webhook',
      response: WebhookOutcomeSchema,
      tag: 'Payments',
      summary: 'Signed payment events (checkout completed, expired, payment failed)',
      access: 'public',
      before: [express.raw({ type: 'application/json', limit: '1mb' })],
    },
    ({ req }) =>
      payments.webhook(
        Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0),
        req.get('stripe-signature'),
      ),
  )
  return router
}

export function paymentsRouter(api: ApiRegistry, payments: PaymentsService) {
  const router = Router()
  const tag = 'Payments'
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/quotes/:id/checkout',
      response: CheckoutAnswerSchema,
      tag,
      summary:
        'Start paying an accepted quote; answers the hosted payment page URL (201), the still open one on a repeat, or a paid quote as paid (200)',
      access: ACCESS.quotes.accept,
      params: IdParamSchema,
      status: 201,
    },
    async ({ user, params, res }) => {
      const { created, ...answer } = await payments.checkout(user, params.id)
      res.status(created ? 201 : 200).json(answer)
      return undefined
    },
  )
  route(
    router,
    api,
    {
      method: 'post',
      path: '/api/quotes/:id/payment-return',
      response: QuoteOrderSchema,
      tag,
      summary: 'Back from the payment page: confirm the session with the payment service',
      access: ACCESS.quotes.accept,
      params: IdParamSchema,
      body: PaymentReturnSchema,
    },
    ({ user, params, body }) => payments.returned(user, params.id, body.sessionId),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/payments/refunds',
      response: z.array(RefundInfoSchema),
      tag,
      summary: 'Second payments of paid quotes and their refunds',
      access: ACCESS.refunds.read,
    },
    () => payments.refunds(),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/quotes/:id/order',
      response: QuoteOrderSchema,
      tag,
      summary: 'The order of a paid quote, or null',
      access: ACCESS.orders.read,
      params: IdParamSchema,
    },
    ({ user, params }) => payments.orderFor(user, params.id),
  )
  route(
    router,
    api,
    {
      method: 'get',
      path: '/api/orders',
      response: z.array(OrderInfoSchema),
      tag,
      summary: 'Orders (a customer sees their company’s)',
      access: ACCESS.orders.read,
    },
    ({ user }) => payments.orders(user),
  )
  return router
}
