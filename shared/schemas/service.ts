import { z } from 'zod'

/** Liveness: 200 with status ok, or 503 degraded when the database does not answer. */
export const HealthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  database: z.enum(['up', 'down']),
  version: z.string(),
  latencyMs: z.number(),
})
export type Health = z.infer<typeof HealthSchema>

/** The OpenAPI 3.1 document of this API. */
export const ApiDocumentSchema = z.looseObject({
  openapi: z.string(),
  info: z.object({ title: z.string(), version: z.string() }),
  paths: z.record(z.string(), z.record(z.string(), z.unknown())),
})

/** What the payment webhook did with an event. */
export const WebhookOutcomeSchema = z.object({ outcome: z.string() })
