import { z } from 'zod'
import type { DesignAcknowledgement } from './design-checks'

/** The build flow of a unit, in order; every step is recorded with who and when. */
export const WORK_ORDER_STATES = ['queued', 'in-build', 'tuning', 'ready', 'shipped'] as const
export const WorkOrderStateSchema = z.enum(WORK_ORDER_STATES)
export type WorkOrderState = z.infer<typeof WorkOrderStateSchema>

export const StatusChangeSchema = z.object({
  to: WorkOrderStateSchema,
  /** the state the caller saw; a move from a state the work order has left is a 409 */
  from: WorkOrderStateSchema.optional(),
  /** required when going back a step */
  note: z.string().trim().max(500).default(''),
})
export type StatusChange = z.infer<typeof StatusChangeSchema>

export const TuningRecordInputSchema = z.object({
  /** Hz, measured on the built unit */
  measuredHz: z.number().positive('must be above zero').max(1000),
  dampingRatio: z.number().min(0).max(1).optional(),
  note: z.string().trim().max(500).default(''),
})
export type TuningRecordInput = z.infer<typeof TuningRecordInputSchema>

/** What production builds: copied when the quote is paid and never changed afterwards. */
export interface BuildSpecification {
  quoteReference: string
  companyName: string
  siteName: string
  unitCode: string
  unitDescription: string
  quantity: number
  orientation: 'vertical' | 'horizontal'
  /** kg, as built (rounded up to whole mass plates) */
  movingMass: number
  massPlates: number | null
  /** N/m */
  springRate: number
  /** N·s/m */
  damperCoefficient: number
  dampingRatio: number
  targetFrequencyHz: number
  /** ± fraction */
  frequencyTolerance: number
  options: string[]
  /** the design load in words, its kind and amplitude; absent on older work orders */
  designLoad?: string
  /** m, the absorber's peak stroke at the design load (for the end stops); absent on older ones */
  stroke?: number
  /** m, the stroke limit the sizing was made to, or null */
  strokeLimit?: number | null
  /** the failed design checks the sizing was handed over with; absent on older work orders */
  designAcknowledgement?: DesignAcknowledgement | null
  /** sales' confirmation of those checks when the quote was sent */
  designConfirmation?: { at: string; byName: string } | null
}
