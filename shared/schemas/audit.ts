import { z } from 'zod'
import { RowIdSchema } from './ids'

/** One recorded change of a quote or a work order, as the admin's audit trail lists it. */
export const AuditEntrySchema = z.object({
  record: z.enum(['quote', 'work-order']),
  recordId: RowIdSchema,
  fromState: z.string().nullable(),
  toState: z.string(),
  at: z.string(),
  note: z.string(),
  actorName: z.string().nullable(),
})
export type AuditEntry = z.infer<typeof AuditEntrySchema>
