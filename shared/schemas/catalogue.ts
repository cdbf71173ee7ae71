import { z } from 'zod'
import { IdSchema, RowIdSchema } from './ids'
import { OrientationSchema } from './sizing'

/** How a unit dissipates energy; names of the trade. */
export const DAMPER_TYPES = ['viscous-fluid', 'eddy-current', 'elastomer', 'friction'] as const
export const DamperTypeSchema = z.enum(DAMPER_TYPES)
export type DamperType = z.infer<typeof DamperTypeSchema>

const minor = z.number().int('whole minor units (cents)').min(0, 'cannot be negative')
/** Price list per currency, in minor units: no exchange rates in a quote. */
const pricesOf = <T extends z.ZodType>(entry: T) => z.object({ EUR: entry, GBP: entry })

const UnitPriceSchema = z.object({ base: minor, perKg: minor })

/**
 * An absorber product line as the admin keeps it. SI units except where named: kg, Hz, m, and
 * the damping ratio as a fraction.
 */
export const ProductLineInputSchema = z
  .object({
    code: z
      .string()
      .trim()
      .regex(/^[A-Z0-9-]{2,24}$/, 'capitals, digits and dashes, 2 to 24'),
    name: z.string().trim().min(1, 'required').max(120),
    description: z.string().trim().max(1000).default(''),
    orientation: OrientationSchema,
    damperType: DamperTypeSchema,
    /** kg, moving mass */
    massMin: z.number().positive('must be above zero'),
    massMax: z.number().positive('must be above zero'),
    /** kg, whole: the mass is built from plates of this size */
    massStep: z.number().int('whole kilograms').positive('must be above zero'),
    frequencyMin: z.number().positive('must be above zero'),
    frequencyMax: z.number().positive('must be above zero'),
    /** m, largest relative displacement the unit's travel allows */
    strokeLimit: z.number().positive('must be above zero'),
    dampingMin: z.number().min(0, 'cannot be negative').max(1, 'at most 1'),
    dampingMax: z.number().min(0, 'cannot be negative').max(1, 'at most 1'),
    leadTimeWeeks: z.number().int().min(0).max(104),
    prices: pricesOf(UnitPriceSchema),
    active: z.boolean().default(true),
  })
  .refine((v) => v.massMax >= v.massMin, { path: ['massMax'], message: 'below the minimum' })
  .refine((v) => v.frequencyMax >= v.frequencyMin, {
    path: ['frequencyMax'],
    message: 'below the minimum',
  })
  .refine((v) => v.dampingMax >= v.dampingMin, {
    path: ['dampingMax'],
    message: 'below the minimum',
  })
export type ProductLineInput = z.infer<typeof ProductLineInputSchema>

export const ProductLineSchema = z.object({
  ...ProductLineInputSchema.shape,
  id: RowIdSchema,
  prices: pricesOf(UnitPriceSchema).nullable(),
})
/** Prices are null for roles that may not see them (engineer, production). */
export type ProductLine = z.infer<typeof ProductLineSchema>

export const OPTION_KINDS = ['option', 'service'] as const
export const OptionKindSchema = z.enum(OPTION_KINDS)
export type OptionKind = z.infer<typeof OptionKindSchema>

/** An extra priced per item: a site tuning visit, installation, a fall restraint, a plate. */
export const CatalogueOptionInputSchema = z.object({
  code: z
    .string()
    .trim()
    .regex(/^[A-Z0-9-]{2,24}$/, 'capitals, digits and dashes, 2 to 24'),
  name: z.string().trim().min(1, 'required').max(120),
  kind: OptionKindSchema,
  /** what one of it is: "visit", "plate", "unit" */
  per: z.string().trim().min(1, 'required').max(24),
  prices: pricesOf(minor),
  active: z.boolean().default(true),
})
export type CatalogueOptionInput = z.infer<typeof CatalogueOptionInputSchema>
export const CatalogueOptionSchema = CatalogueOptionInputSchema.extend({ id: z.number().int() })
export type CatalogueOption = z.infer<typeof CatalogueOptionSchema>

/** One product line judged against a sizing: fits, or the reasons it does not. */
export const UnitMatchSchema = z.object({
  productLineId: RowIdSchema,
  code: z.string(),
  name: z.string(),
  fits: z.boolean(),
  /** kg, the sizing's mass rounded up to whole plates */
  builtMass: z.number(),
  reasons: z.array(z.object({ field: z.string(), message: z.string() })),
})
export type UnitMatch = z.infer<typeof UnitMatchSchema>

export const MatchQuerySchema = z.object({
  sizingId: IdSchema,
  /** with a sizing of several absorbers: the one (1-based) to match */
  absorber: IdSchema.optional(),
})
