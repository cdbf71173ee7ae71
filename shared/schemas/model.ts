/**
 * Shape of a host model and its sizing request (the API and command-line contract).
 * The schema checks types and required fields only; the physics (positive masses, a path to a
 * support, existing mode numbers…) is checked by `validateHost` and `validateRequest` in
 * shared/dynamics (run by `solveSizing`), which throw a `ModelError` naming the field.
 * SI units throughout.
 */
import { z } from 'zod'
import { strictObject } from './strict'

const finite = () => z.number({ error: 'expected a finite number' })
const text = () => z.string({ error: 'expected a text' }).min(1, { error: 'must not be empty' })

/**
 * The documented range of each engine input, SI units. Outside it the eigen-solve and the
 * frequency sweep lose their accuracy or overflow (1e308 kg, 5e-324 N/m, a 1e-300 Hz band), so
 * such a value is refused before any solve, naming the field; the server answers 422. Zero
 * and negative values are left to the engine's own checks, whose messages explain them.
 */
export const ENGINE_RANGES = {
  mass: { min: 1e-6, max: 1e12, unit: 'kg' },
  stiffness: { min: 1e-3, max: 1e15, unit: 'N/m' },
  damping: { min: 1e-9, max: 1e12, unit: 'N·s/m' },
  massRatio: { min: 1e-6, max: 10, unit: '' },
  frequencyRatio: { min: 1e-3, max: 1e3, unit: '' },
  dampingRatio: { min: 1e-9, max: 10, unit: '' },
  frequencyHz: { min: 1e-4, max: 1e6, unit: 'Hz' },
} as const

/** Marks a zod issue as a value outside the engine's range (422, not a malformed body). */
export const OUT_OF_RANGE = { unprocessable: true } as const

/** A band is refused when it is narrower than this fraction of its upper frequency. */
export const MIN_RELATIVE_BAND = 1e-6

const ranged = (name: keyof typeof ENGINE_RANGES) => {
  const { min, max, unit } = ENGINE_RANGES[name]
  const range = `${min} … ${max}${unit ? ` ${unit}` : ''}`
  return finite()
    .refine((v) => v <= 0 || (v >= min && v <= max), {
      message: `outside the engine's range ${range}`,
      params: OUT_OF_RANGE,
    })
    .describe(`${unit || 'ratio'}; the engine's range is ${range}`)
}

export const tuningNameSchema = z.enum([
  'optimize',
  'optimize-h2',
  'den-hartog',
  'asami-nishihara',
  'warburton-force',
  'warburton-base',
  'warburton-base-harmonic',
  'ioi-ikeda',
])

export const nodeSchema = strictObject({
  id: text(),
  label: z.string().optional(),
  /** kg; ignored on a fixed node */
  mass: ranged('mass').optional(),
  /** grounded to a support (wall, column, abutment, foundation) */
  fixed: z.boolean().optional(),
})

export const springSchema = strictObject({
  from: text(),
  to: text(),
  /** N/m */
  stiffness: ranged('stiffness'),
  /** N·s/m, a physical dashpot in parallel */
  damping: ranged('damping').optional(),
})

export const explicitTuningSchema = strictObject({
  /** ω_a / ω_target */
  frequencyRatio: ranged('frequencyRatio'),
  /** c_a / (2 m_a ω_a), referred to the absorber's own frequency */
  dampingRatio: ranged('dampingRatio'),
})

export const absorberSchema = strictObject({
  node: text(),
  /** a second free node: the absorber acts on the relative motion of `node` against it */
  relativeTo: text().optional(),
  /** m_a / m_eff of the target mode at the absorber node; or give `mass` */
  massRatio: ranged('massRatio').optional(),
  /** kg, instead of massRatio */
  mass: ranged('mass').optional(),
  tuning: z.union([tuningNameSchema, explicitTuningSchema]).optional(),
  /** m: the largest stroke allowed at the design load (excitation.amplitude) */
  strokeLimit: finite().optional(),
})

export const bandSchema = strictObject({
  minHz: ranged('frequencyHz'),
  maxHz: ranged('frequencyHz'),
}).refine((b) => !(b.maxHz > b.minHz) || b.maxHz - b.minHz >= MIN_RELATIVE_BAND * b.maxHz, {
  message: `the band is narrower than ${MIN_RELATIVE_BAND} of its upper frequency`,
  path: ['maxHz'],
  params: OUT_OF_RANGE,
})

/** What loads the structure. */
export const LOAD_KINDS = ['force', 'forces', 'mode-shaped', 'base'] as const
export const loadKindSchema = z.enum(LOAD_KINDS)

export const nodeForceSchema = strictObject({
  node: text(),
  /** N, in phase with the other forces of the vector */
  amplitude: finite(),
})

export const excitationSchema = strictObject({
  /** 'force' (default) at `node`; 'forces', a force vector; 'mode-shaped', p ∝ M φ_mode;
   * 'base', support acceleration shared by every fixed node */
  kind: loadKindSchema.optional(),
  /** for 'force' */
  node: text().optional(),
  /** for 'forces' */
  forces: z.array(nodeForceSchema).min(1, { error: 'give at least one force' }).optional(),
  /** for 'mode-shaped': the 1-based mode whose shape the load follows (default the target mode) */
  mode: z.number().int({ error: 'expected a whole mode number (1 = lowest)' }).optional(),
  /** a rotating unbalance: the force grows as ω², so the amplitude is m·e in kg·m */
  unbalance: z.boolean().optional(),
  /** the design load: N (force kinds), m/s² (base), kg·m (unbalance); default 1 */
  amplitude: finite().optional(),
})

export const RESPONSE_QUANTITIES = ['displacement', 'velocity', 'acceleration'] as const
export const responseQuantitySchema = z.enum(RESPONSE_QUANTITIES)

export const responseSchema = strictObject({
  node: text(),
  /** what is read and minimised: displacement (default), velocity or acceleration; under base
   * motion displacement and velocity are relative to the supports, acceleration is absolute */
  quantity: responseQuantitySchema.optional(),
})

/** A machine's running speed (`hz`) or speed range (`minHz`…`maxHz`): the band to tune over. */
export const speedSchema = strictObject({
  hz: ranged('frequencyHz').optional(),
  minHz: ranged('frequencyHz').optional(),
  maxHz: ranged('frequencyHz').optional(),
})

export const modelSchema = strictObject({
  name: z.string().optional(),
  nodes: z.array(nodeSchema).min(1),
  springs: z.array(springSchema),
  /** modal damping ratio of every host mode, or one per mode (ascending frequency) */
  hostDampingRatio: z.union([finite(), z.array(finite())]).optional(),
  absorber: absorberSchema.optional(),
  excitation: excitationSchema.optional(),
  response: responseSchema.optional(),
  /** 1-based, in ascending frequency */
  targetMode: z
    .number({ error: 'expected a mode number' })
    .int({ error: 'expected a whole mode number (1 = lowest)' })
    .min(1, { error: 'modes are numbered from 1 (the lowest)' })
    .optional(),
  band: bandSchema.optional(),
  speed: speedSchema.optional(),
})

export type NodeInput = z.infer<typeof nodeSchema>
export type SpringInput = z.infer<typeof springSchema>
export type TuningName = z.infer<typeof tuningNameSchema>
export type ExplicitTuning = z.infer<typeof explicitTuningSchema>
export type AbsorberInput = z.infer<typeof absorberSchema>
export type BandInput = z.infer<typeof bandSchema>
export type LoadKind = z.infer<typeof loadKindSchema>
export type ExcitationInput = z.infer<typeof excitationSchema>
export type ResponseInput = z.infer<typeof responseSchema>
export type ResponseQuantity = z.infer<typeof responseQuantitySchema>
export type SpeedInput = z.infer<typeof speedSchema>
export type ModelInput = z.infer<typeof modelSchema>

/**
 * Field path of a zod issue in the engine's notation ("springs[2].stiffness").
 * @param path issue path as reported by zod
 */
export function issuePath(path: readonly PropertyKey[]): string {
  return path
    .map((p, i) => (typeof p === 'number' ? `[${p}]` : `${i === 0 ? '' : '.'}${String(p)}`))
    .join('')
}
