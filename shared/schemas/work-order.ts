import { z } from 'zod'
import { RowIdSchema, TimestampSchema } from './ids'
import { DesignAcknowledgementSchema } from './design-checks'
import { DeliveryContactSchema, ShipmentInputSchema, ShipmentSchema } from './shipment'

/** The build flow of a unit, in order; every step is recorded with who and when. */
export const WORK_ORDER_STATES = ['queued', 'in-build', 'tuning', 'ready', 'shipped'] as const
export const WorkOrderStateSchema = z.enum(WORK_ORDER_STATES)
export type WorkOrderState = z.infer<typeof WorkOrderStateSchema>

export const StatusChangeSchema = z
  .object({
    to: WorkOrderStateSchema,
    /** the state the caller saw; a move from a state the work order has left is a 409 */
    from: WorkOrderStateSchema.optional(),
    /** required when going back a step */
    note: z.string().trim().max(500).default(''),
    /** required when marking the work order shipped */
    shipment: ShipmentInputSchema.optional(),
  })
  .superRefine((c, ctx) => {
    if (c.to !== 'shipped' || c.shipment) return
    for (const [field, what] of [
      ['carrier', 'the carrier'],
      ['trackingNumber', 'the tracking number'],
      ['serialNumbers', 'the serial number of each unit'],
    ] as const)
      ctx.addIssue({ code: 'custom', path: ['shipment', field], message: `required: ${what}` })
  })
export type StatusChange = z.infer<typeof StatusChangeSchema>

export const TuningRecordInputSchema = z.object({
  /** Hz, measured on the built unit */
  measuredHz: z.number().positive('must be above zero').max(1000),
  dampingRatio: z.number().min(0).max(1).optional(),
  note: z.string().trim().max(500).default(''),
  /** on a work order of several absorbers: the one measured (1-based) */
  absorber: z.number().int().min(1).max(12).optional(),
})
export type TuningRecordInput = z.infer<typeof TuningRecordInputSchema>

/** One absorber of a work order of several, with its own tuning target and tolerance. */
export const BuildUnitSchema = z.object({
  /** 1-based, as in the sizing */
  absorber: z.number().int(),
  node: z.string(),
  targetMode: z.number().int(),
  unitCode: z.string(),
  /** kg, as built */
  movingMass: z.number(),
  /** N/m */
  springRate: z.number(),
  /** N·s/m */
  damperCoefficient: z.number(),
  dampingRatio: z.number(),
  targetFrequencyHz: z.number(),
  /** ± fraction */
  frequencyTolerance: z.number(),
  /** m, its peak stroke at the design load, or null when unbounded */
  stroke: z.number().nullable(),
})
export type BuildUnit = z.infer<typeof BuildUnitSchema>

/** What production builds: copied when the quote is paid and never changed afterwards. */
export const BuildSpecificationSchema = z.object({
  quoteReference: z.string(),
  companyName: z.string(),
  siteName: z.string(),
  unitCode: z.string(),
  unitDescription: z.string(),
  quantity: z.number(),
  orientation: z.enum(['vertical', 'horizontal']),
  /** kg, as built (rounded up to whole mass plates) */
  movingMass: z.number(),
  massPlates: z.number().nullable(),
  /** N/m */
  springRate: z.number(),
  /** N·s/m */
  damperCoefficient: z.number(),
  dampingRatio: z.number(),
  targetFrequencyHz: z.number(),
  /** ± fraction */
  frequencyTolerance: z.number(),
  options: z.array(z.string()),
  /** the design load in words, its kind and amplitude; absent on older work orders */
  designLoad: z.string().optional(),
  /** m, the absorber's peak stroke at the design load (for the end stops); absent on older ones */
  stroke: z.number().optional(),
  /** m, the stroke limit the sizing was made to, or null */
  strokeLimit: z.number().nullable().optional(),
  /** m, the catalogue unit's travel to its end stops, frozen at payment; absent on older ones */
  unitTravel: z.number().optional(),
  /** the failed design checks the sizing was handed over with; absent on older work orders */
  designAcknowledgement: DesignAcknowledgementSchema.nullable().optional(),
  /** sales' confirmation of those checks when the quote was sent */
  designConfirmation: z.object({ at: z.string(), byName: z.string() }).nullable().optional(),
  /** with several absorbers: each one, tuned and recorded on its own; absent for one */
  units: z.array(BuildUnitSchema).optional(),
})
export type BuildSpecification = z.infer<typeof BuildSpecificationSchema>

/** A work order in the production queue. */
export const WorkOrderRowSchema = z.object({
  id: RowIdSchema,
  orderId: RowIdSchema,
  quoteId: RowIdSchema,
  companyId: RowIdSchema,
  state: WorkOrderStateSchema,
  dueDate: z.string(),
  specification: BuildSpecificationSchema,
  specHash: z.string(),
  /** ORD-2026-0001; '' on a work order whose order was not found */
  orderNumber: z.string(),
  /** who takes delivery on site; null on older work orders */
  delivery: DeliveryContactSchema.nullable(),
  /** carrier, tracking and serial numbers once shipped, else null */
  shipment: ShipmentSchema.nullable(),
  createdAt: TimestampSchema,
  updatedAt: TimestampSchema,
})
export type WorkOrderRow = z.infer<typeof WorkOrderRowSchema>

/** A state change or a tuning measurement of a work order, with who and when. */
export const WorkOrderEventSchema = z.object({
  id: RowIdSchema,
  workOrderId: RowIdSchema,
  kind: z.enum(['state', 'tuning']),
  fromState: z.string().nullable(),
  toState: z.string().nullable(),
  /** Hz */
  measuredHz: z.number().nullable(),
  dampingRatio: z.number().nullable(),
  passes: z.boolean().nullable(),
  /** the absorber a tuning record is of, on a work order of several; else null */
  absorber: z.number().int().nullable().optional(),
  actorId: RowIdSchema.nullable(),
  actorName: z.string().nullable(),
  at: z.string(),
  note: z.string(),
})
export type WorkOrderEvent = z.infer<typeof WorkOrderEventSchema>

/** One work order with its number, latest tuning and history. */
export const WorkOrderSchema = WorkOrderRowSchema.extend({
  number: z.string(),
  latestTuning: WorkOrderEventSchema.omit({ actorName: true }).nullable(),
  events: z.array(WorkOrderEventSchema),
})
export type WorkOrder = z.infer<typeof WorkOrderSchema>
