import { z } from 'zod'
import type { IdentificationResult, IdentifiedPeak, ResultFlag } from '../measurements'

/** What needs care in an identified mode (shared/measurements/plausibility.ts). */
export const ResultFlagSchema = z.enum([
  'damping-out-of-range',
  'coarse-resolution',
  'short-record',
]) satisfies z.ZodType<ResultFlag>

/** The straight-line fit of a decay's log amplitude a damping ratio was read from. */
const LogDecrementFitSchema = z.object({
  dampingRatio: z.number(),
  delta: z.number(),
  cycles: z.number(),
  rSquared: z.number(),
  /** s from the first sample */
  startS: z.number(),
  endS: z.number(),
})

/** One mode identified from a record's spectrum (shared/measurements/types.ts). */
export const IdentifiedPeakSchema: z.ZodType<IdentifiedPeak> = z.object({
  frequencyHz: z.number(),
  dampingRatio: z.number().nullable(),
  method: z.enum(['half-power', 'log-decrement']),
  halfPowerDampingRatio: z.number().nullable(),
  halfPowerBandHz: z.tuple([z.number().nullable(), z.number().nullable()]),
  resolutionHz: z.number(),
  linesInBand: z.number().nullable(),
  logDecrement: LogDecrementFitSchema.nullable(),
  prominence: z.number(),
  amplitude: z.number(),
  flags: z.array(ResultFlagSchema),
  warnings: z.array(z.string()),
})

/** The identification of a record as the engine answers it (shared/measurements/types.ts). */
export const IdentificationResultSchema: z.ZodType<IdentificationResult> = z.object({
  sampleRateHz: z.number(),
  resolutionHz: z.number(),
  kind: z.enum(['decay', 'ambient']),
  kindDetected: z.boolean(),
  window: z.enum(['none', 'exponential', 'hann']),
  averages: z.number(),
  segmentLength: z.number(),
  /** thinned for charts, the largest value of each bucket kept */
  spectrum: z.object({
    frequencyHz: z.array(z.number()),
    amplitude: z.array(z.number()),
    quantity: z.enum(['fourier-amplitude', 'amplitude-spectral-density']),
    unit: z.enum(['m/s', 'm/s²/√Hz']),
  }),
  peaks: z.array(IdentifiedPeakSchema),
  flags: z.array(ResultFlagSchema),
  warnings: z.array(z.string()),
})
