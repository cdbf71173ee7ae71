import { z } from 'zod'
import { BodyIdSchema, PAGE_QUERY, RowIdSchema, TimestampSchema } from './ids'
import { QuoteDraftSchema, QuoteLineSchema, QuoteSendSchema, QuoteStateSchema } from './quote'

/**
 * The sales desk's way from a handed-over sizing to a sent quote: the list of sizings ready to
 * quote, the live pricing of a draft's lines and the preview of the mail to the customer.
 */

export const ReadyQuerySchema = z.object({
  /** words of the title, site or customer */
  search: z.string().trim().max(100).optional(),
  /** most recently handed over first; 25 a page when no limit is given */
  ...PAGE_QUERY,
})
export type ReadyQuery = z.infer<typeof ReadyQuerySchema>

/** A submitted sizing as the sales desk lists it, read from its current revision. */
export const HandedOverSizingSchema = z.object({
  id: RowIdSchema,
  revision: z.number().int(),
  title: z.string(),
  siteName: z.string(),
  companyName: z.string(),
  ownerName: z.string(),
  /** when the engineer handed it over, ISO */
  submittedAt: TimestampSchema.nullable(),
  /** kg */
  absorberMass: z.number().nullable(),
  hostFrequencyHz: z.number().nullable(),
  /** whether the response with the absorber meets the acceptance limit */
  passes: z.boolean().nullable(),
  /** handed over with failed design checks acknowledged by the engineer */
  acknowledged: z.boolean(),
})
export type HandedOverSizing = z.infer<typeof HandedOverSizingSchema>

/** A handed-over sizing with no live quote: none yet, or only expired or withdrawn ones. */
export const ReadySizingSchema = HandedOverSizingSchema.extend({
  /** the newest earlier quote of it (expired or withdrawn), if any */
  lastQuote: z
    .object({ id: z.number().int(), reference: z.string(), state: QuoteStateSchema })
    .nullable(),
})
export type ReadySizing = z.infer<typeof ReadySizingSchema>

/** Prices a draft's lines without saving: from a sizing (a new quote) or a draft's frozen one. */
export const PricePreviewSchema = QuoteDraftSchema.pick({
  currency: true,
  discountBp: true,
  taxRateId: true,
  lines: true,
}).extend({
  /** a new quote: the submitted sizing it is made from */
  sizingId: BodyIdSchema.optional(),
  /** a draft being changed: priced on the sizing frozen into it */
  quoteId: BodyIdSchema.optional(),
})
export type PricePreview = z.infer<typeof PricePreviewSchema>

export const PricedDraftSchema = z.object({
  currency: QuoteDraftSchema.shape.currency,
  lines: z.array(QuoteLineSchema.omit({ position: true })),
  subtotal: z.number().int(),
  discount: z.number().int(),
  discountedSubtotal: z.number().int(),
  taxBp: z.number().int(),
  taxRateName: z.string().nullable(),
  tax: z.number().int(),
  total: z.number().int(),
})
export type PricedDraft = z.infer<typeof PricedDraftSchema>

/** The personal message sales would send, to see the mail it makes. */
export const MailPreviewRequestSchema = QuoteSendSchema.pick({ message: true })

/** The mail a send would put in the customer's mailbox, rendered by the template it sends. */
export const MailPreviewSchema = z.object({
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  attachmentName: z.string(),
})
export type MailPreview = z.infer<typeof MailPreviewSchema>
