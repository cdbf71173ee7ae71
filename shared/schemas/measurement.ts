import { z } from 'zod'
import { IdSchema, IndexSchema } from './ids'
import type {
  ChannelDirection,
  IdentificationResult,
  TimeUnit,
  TimeUnitSource,
} from '../measurements'

/** The largest record file accepted, bytes (8 MiB; about 400 000 rows of time and acceleration). */
export const MAX_RECORD_BYTES = 8 * 1024 * 1024

const optionalText = (max: number) =>
  z.preprocess((v) => (v === '' ? undefined : v), z.string().trim().max(max).optional())

const optionalNumber = <T extends z.ZodType>(schema: T) =>
  z.preprocess((v) => (v === '' || v === null ? undefined : v), schema.optional())

/** Form fields beside the uploaded file; multipart sends every value as a string. */
export const RecordUploadSchema = z.object({
  /** Hz, for a file without a time column */
  sampleRateHz: optionalNumber(z.coerce.number().positive('must be above zero').max(1e6)),
  kind: optionalNumber(z.enum(['decay', 'ambient'])),
  /** unit of the time column; detected from its header or step when absent */
  timeUnit: optionalNumber(z.enum(['s', 'ms'])),
  modelId: optionalNumber(IdSchema),
  nodeId: optionalText(60),
})
export type RecordUpload = z.infer<typeof RecordUploadSchema>

export const PeakAddSchema = z.object({
  /** Hz */
  frequencyHz: z.number().positive('must be above zero'),
})

export const PeakIndexParamsSchema = z.object({
  id: IdSchema,
  index: IndexSchema,
})

export const CalibrateSchema = z.object({
  baseRevision: z.number().int().positive(),
  /** 1-based, in ascending frequency */
  mode: z.number().int().min(1, 'modes are numbered from 1 (the lowest)'),
  /** Hz */
  measuredHz: z.number().positive('must be above zero'),
  recordId: z.number().int().positive().optional(),
  dampingRatio: z.number().min(0).lt(1, 'must be below 1').optional(),
})
export type CalibrateInput = z.infer<typeof CalibrateSchema>

/**
 * A site record taken as evidence for a sizing, with the peaks the engineer paired with host
 * modes. The peak's frequency and damping are copied, so dropping a peak from the record later
 * does not change what the sizing was based on.
 */
export const SizingRecordLinkSchema = z.object({
  recordId: z.number().int().positive(),
  peaks: z
    .array(
      z.object({
        /** 1-based host mode the peak is taken as */
        mode: z.number().int().min(1, 'modes are numbered from 1 (the lowest)'),
        /** Hz */
        frequencyHz: z.number().positive('must be above zero'),
        dampingRatio: z.number().min(0).lt(1, 'must be below 1').nullable(),
      }),
    )
    .max(20),
})
export type SizingRecordLink = z.infer<typeof SizingRecordLinkSchema>

/** A stored record as listed. */
export interface MeasurementRecordSummary {
  id: number
  siteId: number
  modelId: number | null
  nodeId: string | null
  ownerId: number
  ownerName: string
  filename: string
  size: number
  /** Hz */
  sampleRateHz: number
  samples: number
  kind: string
  peakCount: number
  /** every acceleration channel, in column order, with where it was measured */
  channels: RecordChannelInfo[]
  /** unit the time column was read in (null without one) and how it was decided */
  timeUnit: TimeUnit | null
  timeUnitSource: TimeUnitSource | null
  analysisCount: number
  createdAt: string
}

/** One acceleration channel of a stored record. */
export interface RecordChannelInfo {
  name: string
  /** 1-based file column */
  column: number
  nodeId: string | null
  direction: ChannelDirection | null
}

/** One record with its identification. */
export interface MeasurementRecord extends MeasurementRecordSummary {
  result: IdentificationResult
}
