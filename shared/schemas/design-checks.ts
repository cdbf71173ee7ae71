import { z } from 'zod'

/**
 * The checks a sizing must pass before it is handed over without a word: the response against
 * its acceptance limit, the absorber's stroke against the travel of the catalogue's units, and
 * whether any catalogue unit can carry the absorber at all.
 */
export const DESIGN_CHECKS = ['acceptance', 'stroke', 'catalogue'] as const
export const DesignCheckIdSchema = z.enum(DESIGN_CHECKS)
export type DesignCheckId = z.infer<typeof DesignCheckIdSchema>

/** One check of a saved sizing, judged by the server from its stored evaluation. */
export const DesignCheckSchema = z.object({
  check: DesignCheckIdSchema,
  passes: z.boolean(),
  /** a short name: "Acceptance limit" */
  title: z.string(),
  /** plain words that anyone can read, customers included */
  message: z.string(),
  /** specifics for staff, e.g. each catalogue unit and why it cannot carry the absorber */
  details: z.array(z.string()),
})
export type DesignCheck = z.infer<typeof DesignCheckSchema>

/**
 * The engineer's explicit acceptance of a design that fails one or more checks, as stored at
 * handover and frozen into quotes and work orders.
 */
export const DesignAcknowledgementSchema = z.object({
  /** the sizing revision that was handed over */
  revision: z.number().int(),
  failed: z.array(DesignCheckSchema),
  reason: z.string(),
  /** ISO time of the handover */
  at: z.string(),
  /** who acknowledged; null in views for customers */
  byName: z.string().nullable(),
})
export type DesignAcknowledgement = z.infer<typeof DesignAcknowledgementSchema>

/** What the engineer sends with a handover of a design that fails checks. */
export const AcknowledgeInputSchema = z.object({
  /** every failing check, named: the server refuses when one is missing */
  checks: z.array(DesignCheckIdSchema).min(1, 'name the checks you acknowledge').max(3),
  reason: z
    .string()
    .trim()
    .min(10, 'say in a sentence why the design is handed over anyway')
    .max(1000, 'at most 1000 characters'),
})
export type AcknowledgeInput = z.infer<typeof AcknowledgeInputSchema>
