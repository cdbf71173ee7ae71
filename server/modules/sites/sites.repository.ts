import type { DataSource } from 'typeorm'
import type { Site, SiteInput, SiteListItem, SiteListQuery } from '../../../shared/schemas/site'
import {
  columnsOf,
  matching,
  relatedTable,
  sqlPage,
  type Condition,
  type Page,
} from '../../db/list-page'
import { SitePhotoEntity } from './site-photo.entity'
import { SiteEntity } from './site.entity'

function toSite(s: SiteEntity): Site {
  return {
    id: s.id,
    name: s.name,
    companyId: s.companyId,
    companyName: s.company?.name ?? '',
    ownerId: s.ownerId,
    ownerName: s.owner?.name ?? '',
    address: s.address,
    structureKind: s.structureKind,
    contactName: s.contactName,
    contactPhone: s.contactPhone,
    notes: s.notes,
    createdAt: s.createdAt.toISOString(),
    photos: (s.photos ?? []).map((p) => ({
      id: p.id,
      filename: p.filename,
      contentType: p.contentType,
      size: p.size,
      url: `/api/sites/${s.id}/photos/${p.id}`,
    })),
  }
}

/** A sites list row as the database returns it (numbers and dates may come as strings). */
interface SiteListRow extends Omit<SiteListItem, 'photoCount' | 'updatedAt'> {
  photoCount: number | string
  updatedAt: Date | string
}

const toListItem = (r: SiteListRow): SiteListItem => ({
  id: Number(r.id),
  name: r.name,
  companyId: Number(r.companyId),
  companyName: r.companyName ?? '',
  address: r.address,
  structureKind: r.structureKind,
  ownerId: Number(r.ownerId),
  ownerName: r.ownerName ?? '',
  photoCount: Number(r.photoCount),
  updatedAt: new Date(r.updatedAt).toISOString(),
})

/** What a sites list row carries: a photo count, not the photos. */
const LIST_COLUMNS = [
  ...columnsOf('s', 'id name companyId address structureKind ownerId updatedAt'),
  'company.name AS companyName',
  'owner.name AS ownerName',
  '(SELECT COUNT(*) FROM site_photos p WHERE p.siteId = s.id) AS photoCount',
]

/** The list's filters as conditions on `s` (sites) and `company`. */
function listFilters(q: SiteListQuery): Condition[] {
  const where: Condition[] = []
  if (q.search) where.push(matching(q.search, ['s.name', 's.address', 'company.name']))
  if (q.structureKind) where.push({ sql: 's.structureKind = ?', params: [q.structureKind] })
  if (q.companyId) where.push({ sql: 's.companyId = ?', params: [q.companyId] })
  return where
}

export function sitesRepository(ds: DataSource) {
  const repo = ds.getRepository(SiteEntity)
  const photos = ds.getRepository(SitePhotoEntity)
  const relations = { company: true, owner: true, photos: true } as const
  const { metadata } = repo
  const listFrom =
    `${metadata.tableName} s` +
    ` LEFT JOIN ${relatedTable(metadata, 'company')} company ON company.id = s.companyId` +
    ` LEFT JOIN ${relatedTable(metadata, 'owner')} owner ON owner.id = s.ownerId`
  return {
    async findById(id: number) {
      const s = await repo.findOne({ where: { id }, relations })
      return s ? toSite(s) : null
    },
    /**
     * One page of sites, last changed first, with only the columns the list shows (a photo count,
     * not the photos), and the total matching the filters.
     */
    async page(q: SiteListQuery): Promise<Page<SiteListItem>> {
      const { total, rows } = await sqlPage<SiteListRow>(ds, {
        from: listFrom,
        where: listFilters(q),
        columns: LIST_COLUMNS,
        newestFirst: ['s.updatedAt', 's.id'],
        page: q,
      })
      return { total, items: rows.map(toListItem) }
    },
    async create(ownerId: number, input: SiteInput) {
      const saved = await repo.save(repo.create({ ...input, ownerId }))
      return (await this.findById(saved.id)) as Site
    },
    async update(id: number, input: SiteInput) {
      await repo.update({ id }, input)
      return (await this.findById(id)) as Site
    },
    async addPhoto(
      siteId: number,
      p: { filename: string; storedName: string; contentType: string; size: number },
    ) {
      const saved = await photos.save(photos.create({ ...p, siteId }))
      return saved.id
    },
    async findPhoto(siteId: number, photoId: number) {
      return photos.findOneBy({ id: photoId, siteId })
    },
  }
}
export type SitesRepository = ReturnType<typeof sitesRepository>
