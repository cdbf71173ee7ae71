import { z } from 'zod'

/** One recorded change of a quote or a work order, as the admin's audit trail lists it. */
export const AuditEntrySchema = z.object({
  record: z.enum(['quote', 'work-order']),
  recordId: z.number().int(),
  fromState: z.string().nullable(),
  toState: z.string(),
  at: z.string(),
  note: z.string(),
  actorName: z.string().nullable(),
})
export type AuditEntry = z.infer<typeof AuditEntrySchema>
