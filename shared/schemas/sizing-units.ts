/**
 * Further absorbers of a sizing: the sizing's own absorber fields (absorberNode, massRatio,
 * tuning, strokeLimit, relativeToNode at targetMode) are its first unit, and `absorbers` lists
 * the others, each with the mode it aims at. SI units.
 */
import { z } from 'zod'
import { MAX_SET_UNITS } from './absorber-set'
import { explicitTuningSchema, tuningNameSchema } from './model'
import { strictObject } from './strict'

export const SizingUnitSchema = strictObject({
  /** the free node the unit is fixed to */
  node: z.string().min(1, 'required'),
  /** a second node: the unit acts on the relative motion of `node` against it */
  relativeToNode: z.string().min(1, 'required').optional(),
  /** 1-based mode the unit aims at; its mass ratio is on that mode's effective mass at `node` */
  targetMode: z.number().int().min(1, 'modes are numbered from 1 (the lowest)'),
  /** m_a / m_eff of its target mode; or give `mass` */
  massRatio: z.number().min(0.001, 'at least 0.1 %').max(0.5, 'at most 50 %').optional(),
  /** kg, instead of massRatio */
  mass: z.number().positive('must be above zero').max(1e6, 'at most 1e6 kg').optional(),
  /** absent means 'optimize' (tuned together with the other units) */
  tuning: z.union([tuningNameSchema, explicitTuningSchema]).optional(),
  /** m, the largest stroke allowed at the design load: checked, not imposed */
  strokeLimit: z.number().positive('must be above zero').max(10, 'at most 10 m').optional(),
}).superRefine((u, ctx) => {
  if ((u.mass === undefined) === (u.massRatio === undefined))
    ctx.addIssue({
      code: 'custom',
      path: ['massRatio'],
      message: 'give either a mass ratio or a mass',
    })
})
export type SizingUnit = z.infer<typeof SizingUnitSchema>

/** The further units of a sizing: with its first unit at most MAX_SET_UNITS in all. */
export const SizingUnitsSchema = z
  .array(SizingUnitSchema)
  .min(1, 'add a unit or leave the list out')
  .max(MAX_SET_UNITS - 1, `at most ${MAX_SET_UNITS} absorbers in all`)

/** Why a unit of a set carries its tuning: the joint optimum, or the published tuning of its mode
 * because the optimum is flat in that unit (docs/engineering/tuning.md#flat-units). */
export const TUNING_BASES = ['optimum', 'published-flat'] as const
export type TuningBasis = (typeof TUNING_BASES)[number]

/** One unit of a sizing's set as the server sized it (SI units: kg, N/m, N·s/m, Hz, m). */
export const SummaryUnitSchema = z.object({
  node: z.string(),
  relativeTo: z.string().nullable(),
  /** 1-based */
  targetMode: z.number().int(),
  /** kg, of its target mode on its coordinate */
  effectiveMass: z.number(),
  mass: z.number(),
  massRatio: z.number(),
  stiffness: z.number(),
  damping: z.number(),
  frequencyHz: z.number(),
  frequencyRatio: z.number(),
  dampingRatio: z.number(),
  /** m, its largest stroke at the design load with the whole set; null when unbounded */
  stroke: z.number().nullable(),
  strokeLimit: z.number().nullable(),
  /** m, g/ω_a² */
  staticDeflection: z.number(),
  /** 'published-flat' when the set's peak hardly depends on the unit's tuning and it carries Den
   * Hartog's tuning for its mode (docs/engineering/tuning.md#flat-units); absent on summaries made
   * before the rule, which read as 'optimum' */
  tuningBasis: z.enum(TUNING_BASES).optional(),
})
export type SummaryUnit = z.infer<typeof SummaryUnitSchema>

/** The units of one target mode together, against that mode's effective mass. */
export const SetMassRatioSchema = z.object({
  /** 1-based */
  mode: z.number().int(),
  /** kg, Σ of the masses of the units aimed at it */
  mass: z.number(),
  /** kg, the mode's effective mass on the coordinate of the first unit aimed at it */
  effectiveMass: z.number(),
  massRatio: z.number(),
})
export type SetMassRatio = z.infer<typeof SetMassRatioSchema>
