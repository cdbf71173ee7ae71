import { z } from 'zod'
import type { SizingEvaluation } from '../sizing/evaluate-sizing'
import {
  AcknowledgeInputSchema,
  DesignAcknowledgementSchema,
  DesignCheckSchema,
} from './design-checks'
import { IdSchema, PAGE_QUERY, RowIdSchema, TimestampSchema } from './ids'
import {
  bandSchema,
  explicitTuningSchema,
  loadKindSchema,
  nodeForceSchema,
  nodeSchema,
  OUT_OF_RANGE,
  speedSchema,
  springSchema,
  tuningNameSchema,
  type LoadKind,
} from './model'
import { SizingRecordLinkSchema } from './measurement'
import { SetMassRatioSchema, SizingUnitsSchema, SummaryUnitSchema } from './sizing-units'
import { strictObject } from './strict'

/**
 * The largest model the server solves: a whole study at 1000 nodes takes about a second of one
 * worker thread on a small server, and a worker job is cancelled past its time budget anyway.
 */
export const MODEL_LIMITS = { nodes: 1000, springs: 5000 } as const
const LIMIT_REASON =
  'larger models are refused so that one sizing cannot hold the engine for minutes; lump ' +
  'neighbouring masses together'

/** The host structure as the engineer edits it: a revision of a model stores exactly this. */
export const ModelDefinitionSchema = z.object({
  nodes: z
    .array(nodeSchema)
    .min(1, 'add at least one node')
    .refine((a) => a.length <= MODEL_LIMITS.nodes, {
      message: `at most ${MODEL_LIMITS.nodes} nodes: ${LIMIT_REASON}`,
      params: OUT_OF_RANGE,
    }),
  springs: z.array(springSchema).refine((a) => a.length <= MODEL_LIMITS.springs, {
    message: `at most ${MODEL_LIMITS.springs} springs: ${LIMIT_REASON}`,
    params: OUT_OF_RANGE,
  }),
  hostDampingRatio: z.union([z.number(), z.array(z.number())]).default(0.02),
})
export type ModelDefinition = z.infer<typeof ModelDefinitionSchema>

export const ORIENTATIONS = ['vertical', 'horizontal'] as const
export const OrientationSchema = z.enum(ORIENTATIONS)
export type Orientation = z.infer<typeof OrientationSchema>

export const ResponseQuantitySchema = z.enum(['displacement', 'velocity', 'acceleration'])
export type ResponseQuantity = z.infer<typeof ResponseQuantitySchema>

/** An acceptance limit on the peak response at the response node, in SI units. */
export const AcceptanceSchema = strictObject({
  presetId: z.string().max(60).optional(),
  label: z.string().max(160),
  quantity: ResponseQuantitySchema,
  /** m, m/s or m/s², peak (not rms), up to 1e6 */
  limit: z.number().positive('must be above zero').max(1e6, 'at most 1e6'),
})
export type Acceptance = z.infer<typeof AcceptanceSchema>

const SizingInputFields = strictObject({
  title: z.string().trim().min(1, 'required').max(160),
  siteId: RowIdSchema.positive(),
  modelId: RowIdSchema.positive(),
  modelRevision: z.number().int().positive(),
  /** site records the engineer linked as evidence, with the peaks paired with modes */
  records: z.array(SizingRecordLinkSchema).max(20).optional(),
  targetMode: z.number().int().min(1, 'modes are numbered from 1 (the lowest)'),
  absorberNode: z.string().min(1, 'required'),
  /** where a single force acts (loadKind 'force') */
  excitationNode: z.string().min(1, 'required'),
  responseNode: z.string().min(1, 'required'),
  /** N, amplitude of the harmonic design force ('force'; the total for 'mode-shaped'), up to
   * 1e9 N */
  forceAmplitude: z.number().positive('must be above zero').max(1e9, 'at most 1e9 N'),
  loadPresetId: z.string().max(60).optional(),
  massRatio: z.number().min(0.001, 'at least 0.1 %').max(0.5, 'at most 50 %'),
  tuning: z.union([tuningNameSchema, explicitTuningSchema]).default('optimize'),
  orientation: OrientationSchema.default('vertical'),
  /** the limit on the peak response; its quantity is also what the optimiser minimises */
  acceptance: AcceptanceSchema,
  /** ± fraction of the host frequency for the robustness check */
  detuningTolerance: z.number().min(0).max(0.2).default(0.1),
  band: bandSchema.optional(),
  /** what loads the structure: one force (default), a force vector, a load shaped like a mode
   * (walking on a span), or base (support) acceleration; absent means 'force' */
  loadKind: loadKindSchema.optional(),
  /** for loadKind 'forces': N each, in phase (forceAmplitude is not used) */
  forces: z
    .array(nodeForceSchema)
    .min(1, 'give at least one force')
    .max(1000, 'at most 1000 forces')
    .optional(),
  /** for loadKind 'mode-shaped': the mode the load follows (default the target mode) */
  loadMode: z.number().int().min(1, 'modes are numbered from 1 (the lowest)').optional(),
  /** for loadKind 'base': amplitude of the support acceleration, m/s² */
  baseAcceleration: z
    .number()
    .positive('must be above zero')
    .max(1e4, 'at most 1e4 m/s²')
    .optional(),
  /** a machine's running speed { hz } or speed range { minHz, maxHz }: the band to tune over */
  speed: speedSchema.optional(),
  /** kg·m, a rotating unbalance m·e at excitationNode: the force is unbalance × ω²
   * (forceAmplitude is not used) */
  unbalance: z.number().positive('must be above zero').max(1e6, 'at most 1e6 kg·m').optional(),
  /** m, the largest absorber stroke allowed at the design load: a constraint of the optimiser */
  strokeLimit: z.number().positive('must be above zero').max(10, 'at most 10 m').optional(),
  /** a second node: the absorber acts on the relative motion of absorberNode against it */
  relativeToNode: z.string().min(1, 'required').optional(),
  /** further absorbers beside the first (the fields above), each at its own node and mode */
  absorbers: SizingUnitsSchema.optional(),
})

/** Which sizing fields each load kind uses; a field given for another kind is refused. */
const ONLY_FOR: [
  key: 'forces' | 'loadMode' | 'baseAcceleration' | 'unbalance',
  kinds: LoadKind[],
][] = [
  ['forces', ['forces']],
  ['loadMode', ['mode-shaped']],
  ['baseAcceleration', ['base']],
  ['unbalance', ['force']],
]

export const SizingInputSchema = SizingInputFields.superRefine((s, ctx) => {
  const kind = s.loadKind ?? 'force'
  for (const [key, kinds] of ONLY_FOR) {
    if (s[key] !== undefined && !kinds.includes(kind))
      ctx.addIssue({ code: 'custom', path: [key], message: `only for loadKind '${kinds[0]}'` })
  }
  if (kind === 'forces' && !s.forces)
    ctx.addIssue({ code: 'custom', path: ['forces'], message: "required for loadKind 'forces'" })
  if (kind === 'base' && s.baseAcceleration === undefined)
    ctx.addIssue({
      code: 'custom',
      path: ['baseAcceleration'],
      message: "required for loadKind 'base'",
    })
  if (s.speed && s.band)
    ctx.addIssue({
      code: 'custom',
      path: ['speed'],
      message: 'give either a band or a running speed',
    })
})
export type SizingInput = z.infer<typeof SizingInputSchema>

export const SIZING_STATES = ['draft', 'submitted'] as const
export type SizingState = (typeof SIZING_STATES)[number]

/**
 * What sales, the quote and production read of a sizing: the server's authoritative numbers.
 * SI units: kg, N/m, N·s/m, Hz, m.
 */
export const SizingSummarySchema = z.object({
  id: RowIdSchema,
  revision: z.number().int(),
  title: z.string(),
  state: z.enum(SIZING_STATES),
  siteId: RowIdSchema,
  siteName: z.string(),
  companyId: RowIdSchema,
  companyName: z.string(),
  ownerName: z.string(),
  targetMode: z.number().int(),
  hostFrequencyHz: z.number(),
  effectiveMass: z.number(),
  orientation: OrientationSchema,
  absorber: z.object({
    mass: z.number(),
    stiffness: z.number(),
    damping: z.number(),
    frequencyHz: z.number(),
    frequencyRatio: z.number(),
    dampingRatio: z.number(),
  }),
  /** with several units: every unit, the first being `absorber`; absent for a single absorber */
  absorbers: z.array(SummaryUnitSchema).optional(),
  /** kg, Σ of the units' masses (with several units) */
  totalMass: z.number().optional(),
  /** with several units: the mass of the units of each target mode against its effective mass */
  massRatios: z.array(SetMassRatioSchema).optional(),
  /** m, peak relative displacement of the absorber mass at the design load (the largest of any
   * unit with several) */
  stroke: z.number(),
  /** m, the stroke limit the sizing was made to; absent on older sizings */
  strokeLimit: z.number().nullable().optional(),
  /** the design load in words; absent on older sizings */
  load: z.string().optional(),
  /** m, static deflection of a vertical unit, g/ω_a² */
  staticDeflection: z.number(),
  /** peak without ÷ peak with; null when the host has no damping (unbounded without) */
  reduction: z.number().nullable(),
  acceptance: AcceptanceSchema.extend({ responseWith: z.number(), passes: z.boolean() }),
  /** Frequency response before and after, for a chart image in the quote. */
  chart: z.object({
    frequencyHz: z.array(z.number()),
    without: z.array(z.number()),
    with: z.array(z.number()),
  }),
  submittedAt: TimestampSchema.nullable(),
  handoverNote: z.string(),
  /** present when the design fails a check and was handed over with a reason; absent on old quotes */
  designAcknowledgement: DesignAcknowledgementSchema.nullable().optional(),
})
export type SizingSummary = z.infer<typeof SizingSummarySchema>

export const SizingCreateSchema = z.object({ input: SizingInputSchema })

export const SizingSaveSchema = z.object({
  /** the revision this edit started from; a stale one is refused, an identical repeat ignored */
  baseRevision: z.number().int().positive(),
  input: SizingInputSchema,
})
export type SizingSave = z.infer<typeof SizingSaveSchema>

export const SizingSubmitSchema = z.object({
  revision: z.number().int().positive(),
  note: z.string().trim().max(2000).default(''),
  /** required when the stored design fails a check; ignored when it passes them all */
  acknowledge: AcknowledgeInputSchema.optional(),
})
export type SizingSubmit = z.infer<typeof SizingSubmitSchema>

export const SizingListQuerySchema = z.object({
  siteId: IdSchema.optional(),
  state: z.enum(SIZING_STATES).optional(),
  search: z.string().trim().max(100).optional(),
  ...PAGE_QUERY,
})
export type SizingListQuery = z.infer<typeof SizingListQuerySchema>

/** A row of the sizings list. */
export const SizingListItemSchema = z.object({
  id: RowIdSchema,
  title: z.string(),
  state: z.enum(SIZING_STATES),
  revision: z.number().int(),
  siteId: RowIdSchema,
  siteName: z.string(),
  companyName: z.string(),
  ownerId: RowIdSchema,
  ownerName: z.string(),
  /** kg, of every absorber together */
  absorberMass: z.number().nullable(),
  hostFrequencyHz: z.number().nullable(),
  reduction: z.number().nullable(),
  passes: z.boolean().nullable(),
  updatedAt: TimestampSchema,
})
export type SizingListItem = z.infer<typeof SizingListItemSchema>

/**
 * The engine's evaluation of a sizing as stored (shared/sizing/evaluate-sizing): an object here,
 * typed in full by the engine's own types.
 */
export const SizingEvaluationSchema = z.custom<SizingEvaluation>(
  (v) => typeof v === 'object' && v !== null && 'result' in v,
  'an evaluation of the sizing',
)

/** A sizing as the server stores it: the input, its authoritative evaluation and summary. */
export const SizingViewSchema = z.object({
  id: RowIdSchema,
  siteId: RowIdSchema,
  modelId: RowIdSchema,
  ownerId: RowIdSchema,
  ownerName: z.string(),
  title: z.string(),
  state: z.enum(SIZING_STATES),
  currentRevision: z.number().int(),
  /** the revision shown (the current one unless another was asked for) */
  revision: z.number().int(),
  submittedAt: TimestampSchema.nullable(),
  handoverNote: z.string(),
  acknowledgementId: RowIdSchema.nullable(),
  updatedAt: TimestampSchema,
  input: SizingInputSchema,
  evaluation: SizingEvaluationSchema,
  summary: SizingSummarySchema.omit({
    id: true,
    revision: true,
    state: true,
    submittedAt: true,
    handoverNote: true,
    ownerName: true,
  }),
  /** the server's checks of this revision against its limit and the active catalogue */
  designChecks: z.array(DesignCheckSchema),
  /** the failed checks accepted at the current handover, if any */
  acknowledgement: DesignAcknowledgementSchema.nullable(),
})
export type SizingView = z.infer<typeof SizingViewSchema>
