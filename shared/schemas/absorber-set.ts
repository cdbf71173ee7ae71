/**
 * A model with several absorbers (the command-line contract): the model of model.ts with
 * `absorbers`, each entry shaped like `absorber` plus the mode it aims at. SI units.
 */
import { z } from 'zod'
import { absorberSchema, modelSchema } from './model'
import { strictObject } from './strict'

/** Most units in one set: a k × k complex solve per frequency stays cheap (common practice: sets
 * of 2–10 units around one mode are the usual range). */
export const MAX_SET_UNITS = 12

export const setAbsorberSchema = strictObject({
  ...absorberSchema.shape,
  /** 1-based mode this unit aims at (default the model's targetMode, then 1); its mass ratio is
   * stated against that mode's effective mass at its node */
  targetMode: modelSchema.shape.targetMode,
})

export const setModelSchema = strictObject({
  ...modelSchema.shape,
  absorbers: z
    .array(setAbsorberSchema)
    .min(1, { error: 'give at least one absorber' })
    .max(MAX_SET_UNITS, { error: `at most ${MAX_SET_UNITS} absorbers` })
    .optional(),
  /** ± fraction of the host frequency: when given, the units tuned together minimise the worst
   * peak (or mean square) with the host frequency anywhere in that range, instead of at nominal */
  detuningTolerance: z
    .number({ error: 'expected a fraction, e.g. 0.1 for ±10 %' })
    .min(0, { error: 'must be 0 or more' })
    .max(0.3, { error: 'at most 0.3 (±30 %)' })
    .optional(),
})
  .refine((m) => !(m.absorber && m.absorbers), {
    message: 'give either absorber or absorbers, not both',
    path: ['absorbers'],
  })
  .refine((m) => m.detuningTolerance === undefined || m.absorbers, {
    message: 'applies to absorbers only (a single absorber is tuned at the nominal host)',
    path: ['detuningTolerance'],
  })

export type SetAbsorberInput = z.infer<typeof setAbsorberSchema>
export type SetModelInput = z.infer<typeof setModelSchema>
