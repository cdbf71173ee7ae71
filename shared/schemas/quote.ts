import { z } from 'zod'
import { IdSchema, PAGE_QUERY, RowIdSchema, TimestampSchema } from './ids'
import { CURRENCIES } from '../money'
import { SizingSummarySchema } from './sizing'

export const QUOTE_STATES = ['draft', 'sent', 'accepted', 'paid', 'expired', 'withdrawn'] as const
export const QuoteStateSchema = z.enum(QUOTE_STATES)
export type QuoteState = z.infer<typeof QuoteStateSchema>

/** States a customer may see; drafts, expired and withdrawn quotes stay with the supplier. */
export const CUSTOMER_VISIBLE_STATES: readonly QuoteState[] = ['sent', 'accepted', 'paid']

export const CurrencySchema = z.enum(CURRENCIES)

const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'a date as YYYY-MM-DD')

export const QuoteLineInputSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('unit'),
    productLineId: RowIdSchema.positive(),
    quantity: z.number().int('whole units').min(1, 'at least 1').max(999),
    /** with a sizing of several absorbers: the ones (1-based) this line supplies, one each;
     * absent, the next ones not yet on a line */
    absorbers: z.array(z.number().int().min(1).max(12)).min(1).max(12).optional(),
  }),
  z.object({
    kind: z.literal('option'),
    optionId: RowIdSchema.positive(),
    quantity: z.number().int('whole units').min(1, 'at least 1').max(999),
  }),
])
export type QuoteLineInput = z.infer<typeof QuoteLineInputSchema>

/** What sales edit on a draft; prices are never sent by the client. */
export const QuoteDraftSchema = z.object({
  contactId: RowIdSchema.positive().nullable().default(null),
  currency: CurrencySchema.default('EUR'),
  /** basis points, 100 = 1 % */
  discountBp: z
    .number()
    .int('at most two decimals of a per cent')
    .min(0, 'not below 0 %')
    .max(10_000, 'at most 100 %')
    .default(0),
  /**
   * A named tax rate; null prices with the customer company's own rate or the default. The
   * server looks the rate up: a percentage sent by the browser is never used.
   */
  taxRateId: RowIdSchema.positive().nullable().default(null),
  validUntil: isoDate,
  terms: z.string().max(4000).default(''),
  lines: z.array(QuoteLineInputSchema).min(1, 'add at least one line').max(40),
  /** sales confirm a total of zero or less (422 total-unconfirmed without it); not stored */
  confirmTotal: z.boolean().optional(),
})
export type QuoteDraft = z.infer<typeof QuoteDraftSchema>

export const QuoteCreateSchema = QuoteDraftSchema.extend({
  sizingId: RowIdSchema.positive(),
})
export type QuoteCreate = z.infer<typeof QuoteCreateSchema>

export const QuoteListQuerySchema = z.object({
  state: QuoteStateSchema.optional(),
  companyId: IdSchema.optional(),
  /** created on or after, YYYY-MM-DD */
  from: isoDate.optional(),
  /** created on or before, YYYY-MM-DD */
  to: isoDate.optional(),
  search: z.string().trim().max(100).optional(),
  /** newest first; 50 a page when no limit is given */
  ...PAGE_QUERY,
})
export type QuoteListQuery = z.infer<typeof QuoteListQuerySchema>

export const QuoteNoteSchema = z.object({ note: z.string().trim().max(500).default('') })

/** Sending; a quote whose sizing was handed over with failed checks needs them confirmed. */
export const QuoteSendSchema = z.object({
  /** sales have read the acknowledged failed design checks and send the quote with them */
  confirmDesignChecks: z.boolean().default(false),
  /** a personal word from sales, put into the mail above the standard text */
  message: z.string().trim().max(2000, 'at most 2000 characters').default(''),
})
export type QuoteSend = z.infer<typeof QuoteSendSchema>
export const QuoteAcceptSchema = z.object({
  name: z.string().trim().min(1, 'required').max(120),
  purchaseOrder: z.string().trim().min(1, 'required').max(60),
})
export type QuoteAccept = z.infer<typeof QuoteAcceptSchema>

export const QuoteLineSchema = z.object({
  position: z.number().int(),
  kind: z.enum(['unit', 'option', 'service']),
  productLineId: RowIdSchema.nullable(),
  optionId: RowIdSchema.nullable(),
  code: z.string(),
  description: z.string(),
  /** kg as built, for a unit line */
  builtMass: z.number().nullable(),
  /** the sizing's absorbers (1-based) a unit line supplies; absent with a single absorber */
  absorbers: z.array(z.number().int()).optional(),
  quantity: z.number().int(),
  unitPrice: z.number().int(),
  lineTotal: z.number().int(),
})
export type QuoteLine = z.infer<typeof QuoteLineSchema>

export const QuoteEventSchema = z.object({
  fromState: QuoteStateSchema.nullable(),
  toState: QuoteStateSchema,
  actorId: RowIdSchema.nullable(),
  actorName: z.string().nullable(),
  at: z.string(),
  note: z.string(),
})
export type QuoteEvent = z.infer<typeof QuoteEventSchema>

export const QuoteSummarySchema = z.object({
  id: RowIdSchema,
  number: z.string(),
  revision: z.number().int(),
  /** "TDW-2026-0001 rev 2" */
  reference: z.string(),
  state: QuoteStateSchema,
  sizingId: RowIdSchema,
  sizingTitle: z.string(),
  companyId: RowIdSchema,
  companyName: z.string(),
  siteName: z.string(),
  currency: CurrencySchema,
  total: z.number().int(),
  validUntil: z.string(),
  createdAt: TimestampSchema,
  sentAt: TimestampSchema.nullable(),
  latest: z.boolean(),
})
export type QuoteSummary = z.infer<typeof QuoteSummarySchema>

export const QuoteSchema = QuoteSummarySchema.extend({
  contactId: RowIdSchema.nullable(),
  contactName: z.string().nullable(),
  contactEmail: z.string().nullable(),
  discountBp: z.number().int(),
  taxBp: z.number().int(),
  taxRateId: RowIdSchema.nullable(),
  taxRateName: z.string().nullable(),
  terms: z.string(),
  lines: z.array(QuoteLineSchema),
  subtotal: z.number().int(),
  discount: z.number().int(),
  discountedSubtotal: z.number().int(),
  tax: z.number().int(),
  /** The sizing as it was when this revision was made; later edits never reach it. */
  sizing: SizingSummarySchema,
  createdByName: z.string(),
  acceptedAt: TimestampSchema.nullable(),
  acceptedName: z.string().nullable(),
  purchaseOrder: z.string().nullable(),
  paidAt: TimestampSchema.nullable(),
  /** Who in sales confirmed the sizing's acknowledged failed checks when sending, and when. */
  designConfirmation: z.object({ at: z.string(), byName: z.string() }).nullable(),
  /** Supplier-side history; empty for a customer. */
  events: z.array(QuoteEventSchema),
})
export type Quote = z.infer<typeof QuoteSchema>

/**
 * What a customer reads of the sizing behind a quote. Picked field by field: a field added to
 * the sizing for the supplier's own use (the engineer's handover note and name, say) never
 * reaches a customer unless it is listed here. To show a customer a new field, add it here.
 */
export const CustomerSizingSchema = SizingSummarySchema.pick({
  id: true,
  revision: true,
  title: true,
  state: true,
  siteName: true,
  companyName: true,
  targetMode: true,
  hostFrequencyHz: true,
  effectiveMass: true,
  orientation: true,
  absorber: true,
  absorbers: true,
  totalMass: true,
  massRatios: true,
  stroke: true,
  strokeLimit: true,
  load: true,
  staticDeflection: true,
  reduction: true,
  acceptance: true,
  chart: true,
  designAcknowledgement: true,
})
export type CustomerSizing = z.infer<typeof CustomerSizingSchema>

/** A quote as its customer reads it: the supplier's history and internal notes left out. */
export const CustomerQuoteSchema = QuoteSchema.pick({
  id: true,
  number: true,
  revision: true,
  reference: true,
  state: true,
  sizingId: true,
  sizingTitle: true,
  companyId: true,
  companyName: true,
  siteName: true,
  currency: true,
  total: true,
  validUntil: true,
  createdAt: true,
  sentAt: true,
  latest: true,
  contactId: true,
  contactName: true,
  contactEmail: true,
  discountBp: true,
  taxBp: true,
  taxRateName: true,
  terms: true,
  lines: true,
  subtotal: true,
  discount: true,
  discountedSubtotal: true,
  tax: true,
  createdByName: true,
  acceptedAt: true,
  acceptedName: true,
  purchaseOrder: true,
  paidAt: true,
}).extend({ sizing: CustomerSizingSchema })
export type CustomerQuote = z.infer<typeof CustomerQuoteSchema>

/**
 * Builds the customer's view of a quote; unknown keys are dropped, so only listed fields pass.
 * An acknowledgement of failed design checks stays (which limit is not met and why it was
 * accepted) without the name behind it or the staff's specifics.
 */
export function toCustomerQuote(q: Quote): CustomerQuote {
  const c = CustomerQuoteSchema.parse(q)
  const ack = c.sizing.designAcknowledgement
  if (!ack) return c
  const failed = ack.failed.map((f) => ({ ...f, details: [] }))
  return { ...c, sizing: { ...c.sizing, designAcknowledgement: { ...ack, byName: null, failed } } }
}

/** A quote as the caller may see it: the supplier's full view, or a customer's projection. */
export const AnyQuoteSchema = z.union([QuoteSchema, CustomerQuoteSchema])
export type AnyQuote = z.infer<typeof AnyQuoteSchema>
