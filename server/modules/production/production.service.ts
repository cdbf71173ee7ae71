import type { StatusChange, TuningRecordInput } from '../../../shared/schemas/work-order'
import { checkStep } from '../../../shared/production/flow'
import { AppError, notFound, nullIfMissing } from '../../http/app-error'
import type { Mailer } from '../../integrations/mail'
import type { AuthUser } from '../../middleware/authenticate'
import type { QuotesService } from '../quotes/quotes.service'
import type { UsersService } from '../users/users.service'
import type { MovePatch, ProductionRepository } from './production.repository'
import { buildSpecification, specificationHash } from './specification'
import { inlineFontCss, type PdfRenderer } from '../../integrations/pdf/renderer'
import { workOrderHtml } from './work-order-html'
import type { Tx } from '../../db/tx'
import type { WorkOrderListQuery } from '../../../shared/schemas/shipment'
import { orderNumber } from '../payments/format'
import type { OrderFactsOf } from './order-facts'
import { shippingPatch } from './shipping'
import type { WorkOrderQueuePage } from './work-order-queue.repository'
import { shipmentOf, workOrderRow } from './work-order-view'
import { tuningPasses, tuningTarget, unitOutOfTolerance } from './unit-tuning'

const moved = (state: string) =>
  new AppError('state-changed', `Someone else moved this work order to ${state}; reload it.`, 409, {
    state,
  })

export function productionService(deps: {
  repo: ProductionRepository
  queue: WorkOrderQueuePage
  facts: OrderFactsOf
  quotes: QuotesService
  users: Pick<UsersService, 'list'>
  mailer: Mailer
  pdf: PdfRenderer
  now: () => Date
}) {
  async function get(id: number) {
    const w = await deps.repo.findById(id)
    if (!w) throw notFound('work-order')
    const latest = await deps.repo.latestTuning(id)
    return {
      ...workOrderRow(w),
      number: `WO-${String(w.id).padStart(5, '0')}`,
      latestTuning: latest,
      events: await deps.repo.events(id),
    }
  }

  return {
    get,
    /** Every work order, soonest due first (for the server's own use; the API pages). */
    list: async () => (await deps.repo.list()).map(workOrderRow),
    /** One page of the queue as the search, filter and sort ask, and the total matching. */
    async page(q: WorkOrderListQuery) {
      const { items, total } = await deps.queue(q)
      return { items: items.map(workOrderRow), total }
    },

    /**
     * The frozen build values of a quote about to be paid, read before the payment's
     * transaction; `createIn` then writes the work order inside it, with the order's id. Due
     * the catalogue unit's lead time after payment.
     */
    async prepare(quoteId: number, paidAt: Date) {
      const quote = await deps.quotes.internal(quoteId)
      const facts = await deps.facts(quote)
      const specification = {
        ...buildSpecification(quote),
        ...(facts.unitTravel !== undefined && { unitTravel: facts.unitTravel }),
      }
      const due = new Date(paidAt.getTime() + facts.leadWeeks * 7 * 86_400_000)
      const values = {
        specification,
        specHash: specificationHash(specification),
        dueDate: due.toISOString().slice(0, 10),
        delivery: facts.delivery,
      }
      return {
        createIn: (tx: Tx, order: { id: number; quoteId: number; companyId: number }) =>
          deps.repo.createIn(tx, {
            ...values,
            orderId: order.id,
            orderNumber: orderNumber(order.id, paidAt),
            quoteId: order.quoteId,
            companyId: order.companyId,
          }),
      }
    },

    /**
     * One step of the build flow. A move to the state the work order is in already (a repeated
     * tap) answers it as it is; a move from a state it has left is a 409.
     */
    async move(user: AuthUser, id: number, change: StatusChange) {
      const w = await get(id)
      if (w.state === change.to) return w
      if (change.from && change.from !== w.state) throw moved(w.state)
      const forward = `${w.state}>${change.to}`
      const unitFails = unitOutOfTolerance(w.specification, w.events)
      if (unitFails && (forward === 'tuning>ready' || forward === 'ready>shipped')) throw unitFails
      const check = checkStep(w.state, change.to, {
        note: change.note,
        tuningPasses: w.latestTuning?.passes ?? null,
      })
      if (!check.ok) throw new AppError(check.code, check.message, 409)
      const at = deps.now()
      const patch =
        change.to === 'shipped' ? shippingPatch(w.specification, change.shipment, at) : {}
      const done = await deps.repo.move(
        id,
        w.state,
        change.to,
        { actorId: user.id, at, note: change.note },
        patch,
      )
      if (!done) {
        const now = await get(id)
        if (now.state === change.to) return now
        throw moved(now.state)
      }
      if (change.to === 'shipped')
        await notifyShipped(w.companyId, w.specification.quoteReference, w.number, patch)
      return get(id)
    },

    /** Measured frequency of the built unit; the record is kept whether it passes or not. */
    async recordTuning(user: AuthUser, id: number, t: TuningRecordInput) {
      const w = await get(id)
      if (w.state !== 'tuning')
        throw new AppError(
          'not-in-tuning',
          'Move the work order to tuning before recording a measurement.',
          409,
        )
      const target = tuningTarget(w.specification, t.absorber)
      const passes = tuningPasses(t.measuredHz, target)
      await deps.repo.addTuning(id, {
        ...(target.absorber !== null && { absorber: target.absorber }),
        measuredHz: t.measuredHz,
        dampingRatio: t.dampingRatio ?? null,
        passes,
        actorId: user.id,
        at: deps.now(),
        note: t.note,
      })
      return get(id)
    },

    /**
     * Carrier, tracking and serial numbers of a quote's unit once shipped; a customer reads
     * only their own company's (another's is a 404, as if it did not exist).
     */
    async shipmentFor(user: AuthUser, quoteId: number) {
      const q = await nullIfMissing(deps.quotes.internal(quoteId))
      if (!q || (user.role === 'customer' && q.companyId !== user.companyId))
        throw notFound('quote')
      const w = await deps.repo.findByQuote(quoteId)
      return { shipment: w ? shipmentOf(w) : null }
    },

    /** What the customer sees of their order's progress. */
    async stateForQuote(quoteId: number) {
      return (await deps.repo.findByQuote(quoteId))?.state ?? null
    },

    /** A quote's work order state and its changes, for the customer's order timeline. */
    async progressForQuote(quoteId: number) {
      const w = await deps.repo.findByQuote(quoteId)
      return w ? { state: w.state, events: await deps.repo.events(w.id) } : null
    },

    /** Every work order's changes and tuning records, oldest first. */
    allEvents: () => deps.repo.events(),

    /** The workshop sheet as a PDF. */
    async pdf(id: number) {
      const w = await get(id)
      return {
        filename: `${w.number}.pdf`,
        bytes: await deps.pdf.render(workOrderHtml(w, inlineFontCss())),
      }
    },
  }

  async function notifyShipped(companyId: number, reference: string, number: string, s: MovePatch) {
    const carried = `Carrier: ${s.carrier}, tracking number ${s.trackingNumber}.\nSerial numbers: ${(s.serialNumbers ?? []).join(', ')}.`
    const users = (await deps.users.list()).filter(
      (u) => u.active && u.role === 'customer' && u.companyId === companyId,
    )
    for (const u of users) {
      await deps.mailer.send({
        to: u.email,
        subject: `Your absorber has shipped (${reference})`,
        text: `Hello ${u.name},\n\nthe unit of work order ${number} for quote ${reference} has left our works, tuned and tested.\n${carried}\n\nInstallation, anchorage and the fall restraint of the moving mass are for a licensed engineer under the local codes.\n\nTessera Damping Works Ltd`,
      })
    }
  }
}
export type ProductionService = ReturnType<typeof productionService>
