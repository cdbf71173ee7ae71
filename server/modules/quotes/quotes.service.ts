import type {
  QuoteAccept,
  QuoteCreate,
  QuoteDraft,
  QuoteListQuery,
} from '../../../shared/schemas/quote'
import { CUSTOMER_VISIBLE_STATES } from '../../../shared/schemas/quote'
import { AppError } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import { expireDue, isCustomer, quotesCore } from './quote-core'
import { quoteFlow, type QuoteFlowDeps } from './quote-flow'
import { quoteSending } from './quote-send'
import { insertNumbered } from './quote-numbers'
import type { QuoteRow } from './quote-rows'
import type { Tx } from '../../db/tx'
import { dayOf, REVISABLE, sourcesOf } from './quote-states'
import { listSummary, referenceOf, summaryOf } from './quote-view'

const conflict = (code: string, message: string) => new AppError(code, message, 409)

/**
 * Whether the quote already carries this very acceptance (a repeated tap); an acceptance under
 * another name or order number is a 409 that says who accepted it.
 */
function acceptedAs(r: QuoteRow, body: QuoteAccept) {
  if (r.state !== 'accepted' && r.state !== 'paid') return false
  if (r.acceptedName === body.name && r.purchaseOrder === body.purchaseOrder) return true
  throw conflict(
    'quote-accepted-already',
    `This quote was accepted already by ${r.acceptedName ?? 'someone else'} with order ${r.purchaseOrder ?? '—'}.`,
  )
}

export function quotesService(deps: QuoteFlowDeps) {
  const repo = deps.quotes
  const core = quotesCore(deps)
  const sending = quoteSending(deps, core)
  const flow = quoteFlow(deps, core)

  async function move(r: QuoteRow, to: QuoteRow['state'], actorId: number | null, extra = {}) {
    const ok = await repo.transition(r.id, {
      from: sourcesOf(to),
      to,
      actorId,
      at: deps.now(),
      ...extra,
    })
    if (!ok) throw conflict('quote-state', `A ${r.state} quote cannot become ${to}.`)
  }

  return {
    /** One page of the list, newest first, and the total matching the filters (as of today). */
    list: async (user: AuthUser, q: QuoteListQuery) => {
      // Lapsed quotes read as expired in the list itself: a read never runs the expiry update.
      const today = dayOf(deps.now())
      const page = await repo.listPage(
        isCustomer(user)
          ? { ...q, today, companyId: user.companyId ?? -1, states: CUSTOMER_VISIBLE_STATES }
          : { ...q, today },
      )
      return { total: page.total, items: page.rows.map(listSummary) }
    },

    /** A sizing as a new quote would freeze it; another engineer's draft is a 404. */
    sizing: (user: AuthUser, id: number) => deps.sizings.visibleSummary(user, id),

    get: async (user: AuthUser, id: number) => core.view(user, await core.visibleRow(user, id)),

    /** A quote as its customer reads it, for the customer or for sales checking what they see. */
    customerView: async (user: AuthUser, id: number) =>
      core.customerView(await core.visibleRow(user, id)),

    /** The supplier's full view of a quote, for the server's own use (work orders). */
    internal: async (id: number) => core.fullView(await core.row(id)),

    /** A draft quote from a submitted sizing; the sizing is frozen into it. */
    async create(user: AuthUser, input: QuoteCreate) {
      const { sizingId, ...draft } = input
      const sizing = await core.submittedSizing(user, sizingId)
      const p = await core.priced(draft, sizing)
      const at = deps.now()
      const id = await insertNumbered(
        repo,
        { ...p, sizingId, sizing, companyId: sizing.companyId, createdById: user.id },
        user.id,
        at,
      )
      return core.fullView(await core.row(id))
    },

    /** Re-prices a draft from the catalogue; a sent quote is never edited (409). */
    async update(user: AuthUser, id: number, draft: QuoteDraft) {
      const r = await core.row(id)
      if (r.state !== 'draft')
        throw conflict('quote-not-draft', 'Only a draft can be changed; make a revision.')
      const p = await core.priced(draft, r.sizing)
      if (
        !(await repo.replaceDraft(id, {
          ...p,
          sizingId: r.sizingId,
          sizing: r.sizing,
          companyId: r.companyId,
          createdById: r.createdById,
        }))
      )
        throw conflict('quote-not-draft', 'Only a draft can be changed; make a revision.')
      return core.fullView(await core.row(id))
    },

    send: sending.send,
    /** The mail a send would make with this personal message, for sales to read first. */
    mailPreview: sending.mailPreview,
    /** Submitted sizings waiting for a quote, one page at a time. */
    ready: flow.ready,
    /** A draft's lines priced by the server without saving. */
    pricePreview: flow.pricePreview,

    /** A new draft revision copying the lines of the latest one, with the sizing frozen anew. */
    async revise(user: AuthUser, id: number) {
      const r = await core.row(id)
      const latest = await repo.latestRevision(r.number)
      if (latest !== r.revision)
        throw conflict('not-latest', `Revise the latest revision (rev ${latest}).`)
      if (!REVISABLE.includes(r.state))
        throw conflict('quote-state', `A ${r.state} quote cannot be revised.`)
      const sizing = await core.submittedSizing(null, r.sizingId)
      const {
        id: _id,
        state: _s,
        createdAt: _c,
        updatedAt: _u,
        sentAt: _se,
        acceptedAt: _a,
        acceptedName: _an,
        purchaseOrder: _po,
        paidAt: _p,
        designConfirmedById: _dc,
        designConfirmedAt: _da,
        designConfirmedByName: _dn,
        companyName: _cn,
        contactName: _ct,
        contactEmail: _ce,
        createdByName: _cb,
        ...copy
      } = r
      const newId = await repo.insert(
        {
          ...copy,
          sizing,
          revision: latest + 1,
          createdById: user.id,
          lines: r.lines.map(({ position: _pos, ...l }) => l),
        },
        user.id,
        deps.now(),
      )
      return core.fullView(await core.row(newId))
    },

    /** A repeat of a withdrawal answers the withdrawn quote. */
    async withdraw(user: AuthUser, id: number, note: string) {
      const r = await core.row(id)
      if (r.state !== 'withdrawn') await move(r, 'withdrawn', user.id, { note })
      return core.fullView(await core.row(id))
    },

    /**
     * The customer's yes: their name and purchase order; only on the latest sent revision. The
     * same yes repeated answers the accepted quote; a different name or order number is a 409.
     */
    async accept(user: AuthUser, id: number, body: QuoteAccept) {
      const r = await core.visibleRow(user, id)
      if (acceptedAs(r, body)) return core.customerView(r)
      if (r.state !== 'sent')
        throw conflict('quote-state', `A ${r.state} quote cannot be accepted.`)
      if ((await repo.latestRevision(r.number)) !== r.revision)
        throw conflict('not-latest', 'A newer revision of this quote exists.')
      const at = deps.now()
      const ok = await repo.transition(id, {
        from: ['sent'],
        to: 'accepted',
        actorId: user.id,
        at,
        patch: { acceptedAt: at, acceptedName: body.name, purchaseOrder: body.purchaseOrder },
        note: `accepted by ${body.name}, PO ${body.purchaseOrder}`,
      })
      const now = await core.row(id)
      if (ok || acceptedAs(now, body)) return core.customerView(now)
      throw conflict('quote-state', `A ${now.state} quote cannot be accepted.`)
    },

    async pdf(user: AuthUser, id: number) {
      const { bytes, filename } = await sending.renderPdf(await core.visibleRow(user, id))
      return { bytes, filename }
    },

    /** For the payment issue: what to charge. Never trust an amount from the browser. */
    async forPayment(id: number) {
      const r = await core.row(id)
      return {
        id: r.id,
        reference: referenceOf(r.number, r.revision),
        state: r.state,
        companyId: r.companyId,
        currency: r.currency,
        total: r.total,
      }
    },

    /** For the payment webhook: accepted → paid, once. Throws 409 from any other state. */
    async markPaid(quoteId: number, at: Date, note = 'payment confirmed') {
      const r = await core.row(quoteId)
      const ok = await repo.transition(quoteId, {
        from: ['accepted'],
        to: 'paid',
        actorId: null,
        at,
        note,
        patch: { paidAt: at },
      })
      if (!ok) throw conflict('quote-state', `A ${r.state} quote cannot be marked paid.`)
      return summaryOf((await repo.findById(quoteId)) as QuoteRow)
    },

    /** accepted → paid inside the payment's transaction; false from any other state. */
    markPaidIn: (tx: Tx, quoteId: number, at: Date) =>
      repo.transitionIn(tx, quoteId, {
        from: ['accepted'],
        to: 'paid',
        actorId: null,
        at,
        note: 'payment confirmed',
        patch: { paidAt: at },
      }),
    lockIn: (tx: Tx, quoteId: number) => repo.lockIn(tx, quoteId),

    expireDue: (now: Date) => expireDue(repo, now),
    /** Every quote's state changes, for the audit trail. */
    stateChanges: () => repo.allEvents(),
  }
}
export type QuotesService = ReturnType<typeof quotesService>
