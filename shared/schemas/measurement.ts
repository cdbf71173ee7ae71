import { z } from 'zod'
import { IdSchema, IndexSchema, RowIdSchema, TimestampSchema } from './ids'
import { IdentificationResultSchema, IdentifiedPeakSchema } from './identification'
import type { ChannelDirection, TimeUnit, TimeUnitSource } from '../measurements'

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
  recordId: RowIdSchema.positive().optional(),
  dampingRatio: z.number().min(0).lt(1, 'must be below 1').optional(),
})
export type CalibrateInput = z.infer<typeof CalibrateSchema>

/**
 * A site record taken as evidence for a sizing, with the peaks the engineer paired with host
 * modes. The peak's frequency and damping are copied, so dropping a peak from the record later
 * does not change what the sizing was based on.
 */
export const SizingRecordLinkSchema = z.object({
  recordId: RowIdSchema.positive(),
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

/** One acceleration channel of a stored record. */
export const RecordChannelInfoSchema = z.object({
  name: z.string(),
  /** 1-based file column */
  column: z.number().int(),
  nodeId: z.string().nullable(),
  direction: z
    .custom<ChannelDirection>((v) => typeof v === 'string' && /^[+-][xyz]$/.test(v))
    .nullable(),
})
export type RecordChannelInfo = z.infer<typeof RecordChannelInfoSchema>

/** A stored record as listed. */
export const MeasurementRecordSummarySchema = z.object({
  id: RowIdSchema,
  siteId: RowIdSchema,
  modelId: RowIdSchema.nullable(),
  nodeId: z.string().nullable(),
  ownerId: RowIdSchema,
  ownerName: z.string(),
  filename: z.string(),
  size: z.number().int(),
  /** Hz */
  sampleRateHz: z.number(),
  samples: z.number().int(),
  kind: z.string(),
  peakCount: z.number().int(),
  /** every acceleration channel, in column order, with where it was measured */
  channels: z.array(RecordChannelInfoSchema),
  /** unit the time column was read in (null without one) and how it was decided */
  timeUnit: z.enum(['s', 'ms']).nullable() satisfies z.ZodType<TimeUnit | null>,
  timeUnitSource: z
    .enum(['option', 'header', 'step'])
    .nullable() satisfies z.ZodType<TimeUnitSource | null>,
  analysisCount: z.number().int(),
  createdAt: TimestampSchema,
})
export type MeasurementRecordSummary = z.infer<typeof MeasurementRecordSummarySchema>

/** One record with its identification. */
export const MeasurementRecordSchema = MeasurementRecordSummarySchema.extend({
  result: IdentificationResultSchema,
})
export type MeasurementRecord = z.infer<typeof MeasurementRecordSchema>

/** A peak added by hand, and the record with it. */
export const AddedPeakSchema = z.object({
  peak: IdentifiedPeakSchema,
  record: MeasurementRecordSchema,
})
export type AddedPeak = z.infer<typeof AddedPeakSchema>
