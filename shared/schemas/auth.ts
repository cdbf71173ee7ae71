import { z } from 'zod'
import { RowIdSchema, TimestampSchema } from './ids'

export const ROLES = ['engineer', 'sales', 'customer', 'production', 'admin'] as const
export const RoleSchema = z.enum(ROLES)
export type Role = z.infer<typeof RoleSchema>

export const EmailSchema = z.string().trim().toLowerCase().pipe(z.email('a valid e-mail address'))

export const PasswordSchema = z
  .string()
  .min(10, 'at least 10 characters')
  .max(200, 'at most 200 characters')

export const SignInSchema = z.object({
  email: EmailSchema,
  password: z.string().min(1, 'required').max(200),
})
export type SignIn = z.infer<typeof SignInSchema>

export const CurrentUserSchema = z.object({
  id: RowIdSchema,
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  companyId: RowIdSchema.nullable(),
  companyName: z.string().nullable(),
})
export type CurrentUser = z.infer<typeof CurrentUserSchema>

/** The signed-in user, as sign-in and /api/auth/me answer. */
export const SessionSchema = z.object({ user: CurrentUserSchema })
export type Session = z.infer<typeof SessionSchema>

export const InviteSchema = z
  .object({
    email: EmailSchema,
    name: z.string().trim().min(1, 'required').max(120),
    role: RoleSchema,
    companyId: RowIdSchema.positive().nullable().default(null),
  })
  .refine((v) => v.role !== 'customer' || v.companyId !== null, {
    message: 'a customer user belongs to a customer company',
    path: ['companyId'],
  })
export type Invite = z.infer<typeof InviteSchema>

export const UserPatchSchema = z
  .object({ role: RoleSchema.optional(), active: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, {
    message: 'give a role or an active flag',
  })
export type UserPatch = z.infer<typeof UserPatchSchema>

export const SetPasswordSchema = z.object({
  token: z.string().min(20).max(200),
  password: PasswordSchema,
})
export type SetPassword = z.infer<typeof SetPasswordSchema>

export const ResetRequestSchema = z.object({ email: EmailSchema })

export const UserSummarySchema = CurrentUserSchema.extend({
  active: z.boolean(),
  invited: z.boolean(),
  createdAt: TimestampSchema,
})
export type UserSummary = z.infer<typeof UserSummarySchema>

export const CompanySchema = z.object({
  id: RowIdSchema,
  name: z.string(),
  kind: z.enum(['supplier', 'customer']),
})
export type Company = z.infer<typeof CompanySchema>

export const CompanyDetailsSchema = CompanySchema.extend({ address: z.string() })
export type CompanyDetails = z.infer<typeof CompanyDetailsSchema>

/** An acknowledgement with a message for people (a reset request, say). */
export const NoticeSchema = z.object({ message: z.string() })
export type Notice = z.infer<typeof NoticeSchema>
