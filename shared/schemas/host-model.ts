import { z } from 'zod'
import { IdSchema } from './ids'
import { ModelDefinitionSchema } from './sizing'

export const ModelCreateSchema = z.object({
  siteId: z.number().int().positive(),
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

export interface ModelRevisionInfo {
  revision: number
  reason: string
  createdAt: string
  createdByName: string
}

/** One stored revision of a model with its structure: what a sizing on that revision used. */
export interface ModelRevision extends ModelRevisionInfo {
  modelId: number
  definition: z.infer<typeof ModelDefinitionSchema>
}

export interface HostModel {
  id: number
  siteId: number
  siteName: string
  name: string
  ownerId: number
  ownerName: string
  currentRevision: number
  definition: z.infer<typeof ModelDefinitionSchema>
  revisions: ModelRevisionInfo[]
  updatedAt: string
}
