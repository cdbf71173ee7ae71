import { z } from 'zod'
import { IdSchema, PAGE_QUERY, RowIdSchema, TimestampSchema } from './ids'

export const STRUCTURE_KINDS = [
  'floor',
  'footbridge',
  'building',
  'machine-platform',
  'pipework',
  'other',
] as const
export const StructureKindSchema = z.enum(STRUCTURE_KINDS)
export type StructureKind = z.infer<typeof StructureKindSchema>

export const SiteInputSchema = z.object({
  name: z.string().trim().min(1, 'required').max(160),
  companyId: RowIdSchema.positive(),
  address: z.string().trim().max(300).default(''),
  structureKind: StructureKindSchema,
  contactName: z.string().trim().max(120).default(''),
  contactPhone: z.string().trim().max(40).default(''),
  notes: z.string().max(4000).default(''),
})
export type SiteInput = z.infer<typeof SiteInputSchema>

export const SiteListQuerySchema = z.object({
  search: z.string().trim().max(100).optional(),
  structureKind: StructureKindSchema.optional(),
  companyId: IdSchema.optional(),
  ...PAGE_QUERY,
})
export type SiteListQuery = z.infer<typeof SiteListQuerySchema>

export const SitePhotoSchema = z.object({
  id: RowIdSchema,
  filename: z.string(),
  contentType: z.string(),
  size: z.number().int(),
  url: z.string(),
})
export type SitePhoto = z.infer<typeof SitePhotoSchema>

export const SiteSchema = SiteInputSchema.extend({
  id: RowIdSchema,
  companyName: z.string(),
  ownerId: RowIdSchema,
  ownerName: z.string(),
  createdAt: TimestampSchema,
  photos: z.array(SitePhotoSchema),
})
export type Site = z.infer<typeof SiteSchema>

/** A row of the sites list: the columns the list shows, not the notes or the photos. */
export const SiteListItemSchema = z.object({
  id: RowIdSchema,
  name: z.string(),
  companyId: RowIdSchema,
  companyName: z.string(),
  address: z.string(),
  structureKind: StructureKindSchema,
  ownerId: RowIdSchema,
  ownerName: z.string(),
  photoCount: z.number().int(),
  updatedAt: TimestampSchema,
})
export type SiteListItem = z.infer<typeof SiteListItemSchema>
