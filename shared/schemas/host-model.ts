import { z } from 'zod'
import { IdSchema, RowIdSchema, TimestampSchema } from './ids'
import { ModelDefinitionSchema } from './sizing'

export const ModelCreateSchema = z.object({
  siteId: RowIdSchema.positive(),
  name: z.string().trim().min(1, 'required').max(160),
  definition: ModelDefinitionSchema,
  reason: z.string().trim().max(300).default('first version'),
})
export type ModelCreate = z.infer<typeof ModelCreateSchema>

export const ModelReviseSchema = z.object({
  /** the revision this edit started from; a stale one is refused, an identical repeat is ignored */
  baseRevision: z.number().int().positive(),
  definition: ModelDefinitionSchema,
  reason: z.string().trim().min(1, 'say why the model changed').max(300),
})
export type ModelRevise = z.infer<typeof ModelReviseSchema>

export const ModelListQuerySchema = z.object({
  siteId: IdSchema.optional(),
})

export const ModelRevisionParamsSchema = z.object({
  id: z.coerce.number().int().positive(),
  revision: z.coerce.number().int().positive(),
})

export const ModelRevisionInfoSchema = z.object({
  revision: z.number().int(),
  reason: z.string(),
  createdAt: TimestampSchema,
  createdByName: z.string(),
})
export type ModelRevisionInfo = z.infer<typeof ModelRevisionInfoSchema>

/** One stored revision of a model with its structure: what a sizing on that revision used. */
export const ModelRevisionSchema = ModelRevisionInfoSchema.extend({
  modelId: RowIdSchema,
  definition: ModelDefinitionSchema,
})
export type ModelRevision = z.infer<typeof ModelRevisionSchema>

export const HostModelSchema = z.object({
  id: RowIdSchema,
  siteId: RowIdSchema,
  siteName: z.string(),
  name: z.string(),
  ownerId: RowIdSchema,
  ownerName: z.string(),
  currentRevision: z.number().int(),
  definition: ModelDefinitionSchema,
  revisions: z.array(ModelRevisionInfoSchema),
  updatedAt: TimestampSchema,
})
export type HostModel = z.infer<typeof HostModelSchema>
