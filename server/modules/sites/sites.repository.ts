import type { DataSource } from 'typeorm'
import type { Site, SiteInput, SiteListQuery } from '../../../shared/schemas/site'
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

export function sitesRepository(ds: DataSource) {
  const repo = ds.getRepository(SiteEntity)
  const photos = ds.getRepository(SitePhotoEntity)
  const relations = { company: true, owner: true, photos: true } as const
  return {
    async findById(id: number) {
      const s = await repo.findOne({ where: { id }, relations })
      return s ? toSite(s) : null
    },
    async list(q: SiteListQuery) {
      const qb = repo
        .createQueryBuilder('s')
        .leftJoinAndSelect('s.company', 'company')
        .leftJoinAndSelect('s.owner', 'owner')
        .leftJoinAndSelect('s.photos', 'photos')
        .orderBy('s.updatedAt', 'DESC')
      if (q.search) {
        qb.andWhere('(s.name LIKE :q OR s.address LIKE :q OR company.name LIKE :q)', {
          q: `%${q.search.replace(/[%_\\]/g, '\\$&')}%`,
        })
      }
      if (q.structureKind) qb.andWhere('s.structureKind = :k', { k: q.structureKind })
      if (q.companyId) qb.andWhere('s.companyId = :c', { c: q.companyId })
      return (await qb.getMany()).map(toSite)
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
