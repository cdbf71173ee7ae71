import { z } from 'zod'
import { AppError } from '../../http/app-error'

// Ids of the payment service: a short prefix, an underscore, letters and digits.
const objectId = (prefix: string) =>
  z
    .string()
    .max(255)
    .regex(new RegExp(`^${prefix}_[A-Za-z0-9_]{1,240}$`), `an id starting ${prefix}_`)
const metadata = z.record(z.string().max(100), z.string().max(500)).nullish()

/** The checkout session fields the app reads, from an event or from retrieving it. */
export const SessionObjectSchema = z.object({
  id: objectId('cs'),
  status: z.string().max(20).nullish(),
  payment_status: z.string().max(30).nullish(),
  amount_total: z.number().int().nullish(),
  currency: z.string().max(3).nullish(),
  payment_intent: z.string().max(255).nullish(),
  metadata,
})
export type SessionObject = z.infer<typeof SessionObjectSchema>

const IntentObjectSchema = z.object({ id: objectId('pi'), metadata })
const RefundObjectSchema = z.object({
  id: objectId('re'),
  amount: z.number().int().nonnegative(),
  currency: z.string().max(3),
  payment_intent: z.string().max(255).nullish(),
  status: z.string().max(30).nullish(),
  metadata,
})

const envelope = <T extends string, O extends z.ZodType>(types: readonly T[], object: O) =>
  z.object({
    id: objectId('evt'),
    type: z.enum(types as [T, ...T[]]),
    data: z.object({ object }),
  })

/** The events the app acts on; anything else verified is acknowledged and ignored. */
export const HandledEventSchema = z.discriminatedUnion('type', [
  envelope(
    ['checkout.session.completed', 'checkout.session.async_payment_succeeded'],
    SessionObjectSchema,
  ),
  envelope(['checkout.session.expired'], SessionObjectSchema),
  envelope(['payment_intent.payment_failed'], IntentObjectSchema),
  envelope(['refund.created', 'refund.updated'], RefundObjectSchema),
])
export type HandledEvent = z.infer<typeof HandledEventSchema>

const AnyEventSchema = z.object({ id: objectId('evt'), type: z.string().min(1).max(80) })

/**
 * Reads a verified event: the shape of the ones the app acts on is checked field by field,
 * so a signed but malformed event (null id, a megabyte id) is a 400, not a database error.
 * @returns null for a well-formed event of a type the app does not act on
 */
export function parseEvent(event: unknown): HandledEvent | null {
  const head = AnyEventSchema.safeParse(event)
  if (!head.success) throw invalidEvent(head.error)
  const handled = HandledEventSchema.safeParse(event)
  if (handled.success) return handled.data
  const known = HandledEventSchema.options.some((o) =>
    o.shape.type.options.includes(head.data.type as never),
  )
  if (known) throw invalidEvent(handled.error)
  return null
}

function invalidEvent(error: z.ZodError) {
  const details = error.issues.map((i) => ({
    path: ['event', ...i.path.map(String)].join('.'),
    message: i.message,
  }))
  return new AppError('invalid-event', 'The event is signed but malformed.', 400, details)
}
