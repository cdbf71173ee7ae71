import { z } from 'zod'
import {
  CheckoutAnswerSchema,
  OrderInfoSchema,
  QuoteOrderSchema,
  RefundInfoSchema,
} from '../../../shared/schemas/payment'
import { WebhookOutcomeSchema } from '../../../shared/schemas/service'
import express from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema } from '../../../shared/schemas/ids'
import { PaymentReturnSchema } from '../../../shared/schemas/payment'
import type { ApiRegistry } from '../../http/api-registry'
import { routeTable } from '../../http/route-table'
import type { PaymentsService } from './payments.service'

/** Mounted before the JSON parser: the signature is over the raw bytes. */
export function paymentsWebhookRouter(api: ApiRegistry, payments: PaymentsService) {
  const routes = routeTable(api, 'Payments', {})
  routes.post('/api/payments/webhook', {
    summary: 'Signed payment events (checkout completed, expired, payment failed)',
    response: WebhookOutcomeSchema,
    access: 'public',
    before: [express.raw({ type: 'application/json', limit: '1mb' })],
    answer: ({ req }) =>
      payments.webhook(
        Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0),
        req.get('stripe-signature'),
      ),
  })
  return routes.router
}

export function paymentsRouter(api: ApiRegistry, payments: PaymentsService) {
  const routes = routeTable(api, 'Payments', {})
  routes.post('/api/quotes/:id/checkout', {
    summary:
      'Start paying an accepted quote; answers the hosted payment page URL (201), the still open one on a repeat, or a paid quote as paid (200)',
    response: CheckoutAnswerSchema,
    access: ACCESS.quotes.accept,
    params: IdParamSchema,
    status: 201,
    answer: async ({ user, params, res }) => {
      const { created, ...answer } = await payments.checkout(user, params.id)
      res.status(created ? 201 : 200).json(answer)
      return undefined
    },
  })
  routes.post('/api/quotes/:id/payment-return', {
    summary: 'Back from the payment page: confirm the session with the payment service',
    response: QuoteOrderSchema,
    access: ACCESS.quotes.accept,
    params: IdParamSchema,
    body: PaymentReturnSchema,
    answer: ({ user, params, body }) => payments.returned(user, params.id, body.sessionId),
  })
  routes.get('/api/payments/refunds', {
    summary: 'Second payments of paid quotes and their refunds',
    response: z.array(RefundInfoSchema),
    access: ACCESS.refunds.read,
    answer: () => payments.refunds(),
  })
  routes.get('/api/quotes/:id/order', {
    summary: 'The order of a paid quote, or null',
    response: QuoteOrderSchema,
    access: ACCESS.orders.read,
    params: IdParamSchema,
    answer: ({ user, params }) => payments.orderFor(user, params.id),
  })
  routes.get('/api/orders', {
    summary: 'Orders (a customer sees their company’s)',
    response: z.array(OrderInfoSchema),
    access: ACCESS.orders.read,
    answer: ({ user }) => payments.orders(user),
  })
  return routes.router
}
