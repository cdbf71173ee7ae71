import { z } from 'zod'
import { PAGE_QUERY, TimestampSchema } from './ids'

/** Who takes delivery on site, read from the site (or the quote's contact) when the order was paid. */
export const DeliveryContactSchema = z.object({
  name: z.string(),
  phone: z.string(),
  address: z.string(),
})
export type DeliveryContact = z.infer<typeof DeliveryContactSchema>

/** What shipping records; every field is required when a work order is marked shipped. */
export const ShipmentInputSchema = z.object({
  carrier: z.string().trim().min(1, 'required: the carrier').max(80),
  trackingNumber: z.string().trim().min(1, 'required: the tracking number').max(80),
  /** one per unit shipped, each unique */
  serialNumbers: z
    .array(z.string().trim().min(1, 'required: the serial number').max(40))
    .min(1, 'required: the serial number of each unit')
    .max(100)
    .refine((s) => new Set(s).size === s.length, 'each serial number once'),
})
export type ShipmentInput = z.infer<typeof ShipmentInputSchema>

/** A shipped unit as its customer and production see it. */
export const ShipmentSchema = z.object({
  carrier: z.string(),
  trackingNumber: z.string(),
  serialNumbers: z.array(z.string()),
  shippedAt: TimestampSchema,
})
export type Shipment = z.infer<typeof ShipmentSchema>

/** A quote's shipment, or null until its unit has left the works. */
export const QuoteShipmentSchema = z.object({ shipment: ShipmentSchema.nullable() })
export type QuoteShipment = z.infer<typeof QuoteShipmentSchema>

export const WORK_ORDER_SORTS = ['due', 'order', 'quote', 'customer', 'site', 'state'] as const

/** The production queue: one page, filtered and sorted on the server. */
export const WorkOrderListQuerySchema = z.object({
  /** matches the order number, quote reference, customer, site or unit, in any case */
  search: z.string().trim().max(100).optional(),
  state: z.enum(['queued', 'in-build', 'tuning', 'ready', 'shipped', 'open']).optional(),
  sort: z.enum(WORK_ORDER_SORTS).default('due'),
  dir: z.enum(['asc', 'desc']).default('asc'),
  /** 50 a page when no limit is given */
  ...PAGE_QUERY,
})
export type WorkOrderListQuery = z.infer<typeof WorkOrderListQuerySchema>
