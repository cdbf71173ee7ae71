import { z } from 'zod'
import { RowIdSchema, TimestampSchema } from './ids'

/** A named tax rate as the admin sets it up; 2000 basis points = 20 %. */
export const TaxRateInputSchema = z.object({
  name: z.string().trim().min(1, 'required').max(60, 'at most 60 characters'),
  rateBp: z
    .number()
    .int('whole basis points (0.01 %)')
    .min(0, 'not below 0 %')
    .max(10_000, 'at most 100 %'),
  /** the rate of every customer without a rate of its own */
  isDefault: z.boolean().default(false),
})
export type TaxRateInput = z.infer<typeof TaxRateInputSchema>

export const TaxRateSchema = TaxRateInputSchema.extend({
  id: RowIdSchema,
  updatedAt: TimestampSchema,
})
export type TaxRate = z.infer<typeof TaxRateSchema>

/** A customer company's own rate; null returns it to the default. */
export const CompanyTaxRateSchema = z.object({
  taxRateId: RowIdSchema.positive().nullable(),
})
export type CompanyTaxRate = z.infer<typeof CompanyTaxRateSchema>

export const TaxSettingsSchema = z.object({
  rates: z.array(TaxRateSchema),
  companies: z.array(
    z.object({
      companyId: RowIdSchema,
      companyName: z.string(),
      taxRateId: RowIdSchema.nullable(),
    }),
  ),
})
export type TaxSettings = z.infer<typeof TaxSettingsSchema>

/** The rate a quote is priced with, chosen on the server. */
export interface AppliedTaxRate {
  taxRateId: number | null
  taxRateName: string | null
  taxBp: number
}
