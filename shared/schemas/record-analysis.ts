import { z } from 'zod'
import { RowIdSchema, TimestampSchema } from './ids'
import { ResultFlagSchema } from './identification'
import type { SsiIdentification } from '../measurements/identify-modes-ssi'
import type { ModalIdentification } from '../measurements/modal-types'
import { CHANNEL_DIRECTIONS, type ChannelDirection } from '../measurements/channels'
import type { ResultFlag } from '../measurements/plausibility'
import type { ModelUpdate } from '../updating/types'
import type { HostModel } from './host-model'

const nodeId = z.string().trim().min(1, 'must not be empty').max(60)

/** Where each acceleration channel of a record sat: the model and, per channel, node and axis. */
export const ChannelMapSchema = z.object({
  /** the host model the nodes belong to; null unties the record from any model */
  modelId: RowIdSchema.positive().nullable(),
  /** one entry per channel, in column order */
  channels: z
    .array(
      z.object({
        nodeId: nodeId.nullable(),
        direction: z
          .enum(CHANNEL_DIRECTIONS as [ChannelDirection, ...ChannelDirection[]])
          .nullable(),
      }),
    )
    .min(1, 'give one entry per channel')
    .max(64),
})
export type ChannelMap = z.infer<typeof ChannelMapSchema>

/** How to identify the modes of a record from all its channels. */
export const AnalysisRunSchema = z
  .object({
    /** 'fdd': frequency-domain decomposition with EFDD damping; 'ssi': covariance-driven SSI */
    method: z.enum(['fdd', 'ssi']),
    /** Hz: lowest frequency of interest */
    minFrequencyHz: z.number().positive('must be above zero').max(1e5).optional(),
    /** Hz: highest frequency of interest */
    maxFrequencyHz: z.number().positive('must be above zero').max(1e5).optional(),
    /** SSI only: highest model order of the stabilisation diagram (even) */
    maxOrder: z
      .number()
      .int()
      .min(4, 'at least 4')
      .max(80, 'at most 80')
      .refine((n) => n % 2 === 0, 'must be even')
      .optional(),
  })
  .refine((o) => !(o.minFrequencyHz && o.maxFrequencyHz && o.minFrequencyHz >= o.maxFrequencyHz), {
    message: 'must be above the lowest frequency',
    path: ['maxFrequencyHz'],
  })
export type AnalysisRun = z.infer<typeof AnalysisRunSchema>

/** A mode as every method reports it, for tables and model updating. */
export interface AnalysisMode {
  frequencyHz: number
  /** fraction of critical; null when it could not be measured */
  dampingRatio: number | null
  /** one entry per channel in column order, largest 1 */
  shape: number[]
  flags: ResultFlag[]
  warnings: string[]
}

/** One stored identification of a record's modes. */
export interface RecordAnalysis {
  id: number
  recordId: number
  ownerId: number
  method: 'fdd' | 'ssi'
  modes: AnalysisMode[]
  /** the whole result: singular values (FDD) or the stabilisation diagram (SSI) */
  result: ModalIdentification | SsiIdentification
  createdAt: string
}

/** A record's time history thinned for a chart (the extremes of every bucket kept). */
export interface RecordTimeHistory {
  sampleRateHz: number
  /** s */
  timeS: number[]
  /** m/s², one series per channel */
  channels: { name: string; values: number[] }[]
}

const factorBound = z.number().positive('must be above zero').max(100)

/** A group of springs or masses that the update may scale by one factor. */
export const ParameterGroupSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('stiffness'),
    name: z.string().trim().max(80).optional(),
    /** indices into the model's springs */
    springs: z.array(z.number().int().min(0)).min(1, 'choose at least one spring').max(500),
    lower: factorBound.optional(),
    upper: factorBound.optional(),
  }),
  z.object({
    kind: z.literal('mass'),
    name: z.string().trim().max(80).optional(),
    nodes: z.array(nodeId).min(1, 'choose at least one mass').max(500),
    lower: factorBound.optional(),
    upper: factorBound.optional(),
  }),
])

/** Update a model from the modes of one analysis of a record whose channels are mapped. */
export const ModelUpdateRequestSchema = z.object({
  /** the revision the engineer looked at; the update is refused when the model moved on */
  baseRevision: z.number().int().positive(),
  analysisId: RowIdSchema.positive(),
  /** indices into the analysis's modes; default every mode */
  modes: z.array(z.number().int().min(0)).min(1, 'choose at least one mode').max(20).optional(),
  groups: z.array(ParameterGroupSchema).min(1, 'choose what may change').max(12),
})
export type ModelUpdateRequest = z.infer<typeof ModelUpdateRequestSchema>

/** A preview of an update, and after saving, the model at its new revision. */
export interface ModelUpdateAnswer {
  update: ModelUpdate
  model: HostModel | null
}

/** An engine object passed through as it is (its type is the engine's); checked to be an object. */
const engineObject = <T>(what: string) =>
  z.custom<T>((v) => typeof v === 'object' && v !== null, `an ${what}`)

/** The answers of the record-analysis routes, for the OpenAPI document and the API tests. */
export const AnalysisModeSchema: z.ZodType<AnalysisMode> = z.object({
  frequencyHz: z.number(),
  dampingRatio: z.number().nullable(),
  shape: z.array(z.number()),
  flags: z.array(ResultFlagSchema),
  warnings: z.array(z.string()),
})

export const RecordAnalysisSchema: z.ZodType<RecordAnalysis> = z.object({
  id: RowIdSchema,
  recordId: RowIdSchema,
  ownerId: RowIdSchema,
  method: z.enum(['fdd', 'ssi']),
  modes: z.array(AnalysisModeSchema),
  result: engineObject<ModalIdentification | SsiIdentification>('identification'),
  createdAt: TimestampSchema,
})

export const RecordTimeHistorySchema: z.ZodType<RecordTimeHistory> = z.object({
  sampleRateHz: z.number(),
  timeS: z.array(z.number()),
  channels: z.array(z.object({ name: z.string(), values: z.array(z.number()) })),
})

export const ModelUpdateAnswerSchema: z.ZodType<ModelUpdateAnswer> = z.object({
  update: engineObject<ModelUpdate>('update'),
  model: engineObject<HostModel>('host model').nullable(),
})
