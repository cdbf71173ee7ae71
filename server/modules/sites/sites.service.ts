import type { Site, SiteInput, SiteListQuery } from '../../../shared/schemas/site'
import type { AuthUser } from '../../middleware/authenticate'
import { AppError, forbidden, notFound } from '../../http/app-error'
import type { FileStore } from '../../integrations/file-store'
import type { CompaniesService } from '../companies/companies.service'
import type { SitesRepository } from './sites.repository'
import { imageType } from './image-type'

export const MAX_PHOTO_BYTES = 12 * 1024 * 1024

export function sitesService(deps: {
  sites: SitesRepository
  companies: CompaniesService
  files: FileStore
}) {
  async function customerCompany(id: number) {
    const c = await deps.companies.findById(id)
    if (!c || c.kind !== 'customer') {
      throw new AppError('company-not-found', 'Choose a customer company.', 400, [
        { path: 'body.companyId', message: 'unknown customer company' },
      ])
    }
  }

  async function get(id: number): Promise<Site> {
    const site = await deps.sites.findById(id)
    if (!site) throw notFound('site')
    return site
  }

  /** Sites are shared among engineers; only the one who made a site (or an admin) edits it. */
  function assertCanEdit(user: AuthUser, site: Site) {
    if (user.role !== 'admin' && site.ownerId !== user.id)
      throw forbidden('Only the engineer who made this site may change it.')
  }

  return {
    get,
    /** One page of the list (every row without a limit) and the total matching. */
    page: (q: SiteListQuery) => deps.sites.page(q),
    /** The rows of `page` alone. */
    list: async (q: SiteListQuery) => (await deps.sites.page(q)).items,
    async create(user: AuthUser, input: SiteInput) {
      await customerCompany(input.companyId)
      return deps.sites.create(user.id, input)
    },
    async update(user: AuthUser, id: number, input: SiteInput) {
      assertCanEdit(user, await get(id))
      await customerCompany(input.companyId)
      return deps.sites.update(id, input)
    },
    async addPhoto(
      user: AuthUser,
      id: number,
      file: { originalname: string; buffer: Buffer } | undefined,
    ) {
      assertCanEdit(user, await get(id))
      if (!file || file.buffer.length === 0) {
        throw new AppError('invalid-upload', 'Attach a photo in the field "photo".', 400, [
          { path: 'file.photo', message: 'missing or empty' },
        ])
      }
      const type = imageType(file.buffer)
      if (!type) {
        throw new AppError('invalid-upload', 'A photo must be a JPEG, PNG or WebP image.', 415, [
          { path: 'file.photo', message: 'not an image' },
        ])
      }
      const storedName = await deps.files.save(file.buffer, type.extension)
      await deps.sites.addPhoto(id, {
        filename: file.originalname.slice(0, 200),
        storedName,
        contentType: type.contentType,
        size: file.buffer.length,
      })
      return get(id)
    },
    async photo(id: number, photoId: number) {
      const p = await deps.sites.findPhoto(id, photoId)
      if (!p) throw notFound('photo')
      return { contentType: p.contentType, bytes: await deps.files.read(p.storedName) }
    },
  }
}
export type SitesService = ReturnType<typeof sitesService>
