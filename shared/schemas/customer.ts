import { z } from 'zod'
import { IdSchema, PAGE_QUERY, RowIdSchema } from './ids'
import { EmailSchema } from './auth'

export const CustomerInputSchema = z.object({
  name: z.string().trim().min(1, 'required').max(160),
  address: z.string().trim().max(300).default(''),
})
export type CustomerInput = z.infer<typeof CustomerInputSchema>

export const ContactInputSchema = z.object({
  name: z.string().trim().min(1, 'required').max(120),
  email: EmailSchema,
  phone: z.string().trim().max(40).default(''),
  position: z.string().trim().max(120).default(''),
})
export type ContactInput = z.infer<typeof ContactInputSchema>

export const ContactSchema = ContactInputSchema.extend({
  id: RowIdSchema,
  companyId: RowIdSchema,
  /** The customer user made from this contact by an invitation, if any. */
  userId: RowIdSchema.nullable(),
})
export type Contact = z.infer<typeof ContactSchema>

export const CustomerSchema = z.object({
  id: RowIdSchema,
  name: z.string(),
  address: z.string(),
  contacts: z.array(ContactSchema),
})
export type Customer = z.infer<typeof CustomerSchema>

/** The customers list: by name, with a search over name and address, one page at a time. */
export const CustomerListQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  ...PAGE_QUERY,
})
export type CustomerListQuery = z.infer<typeof CustomerListQuerySchema>

export const ContactParamsSchema = z.object({
  id: IdSchema,
  contactId: IdSchema,
})
