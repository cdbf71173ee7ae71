import { z } from 'zod'
import { SiteListItemSchema, SiteSchema } from '../../../shared/schemas/site'
import { Router } from 'express'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema, IdSchema } from '../../../shared/schemas/ids'
import { SiteInputSchema, SiteListQuerySchema } from '../../../shared/schemas/site'
import type { ApiRegistry } from '../../http/api-registry'
import { answerPage } from '../../http/page'
import { routesFor } from '../../http/route'
import { singleUpload } from '../../http/upload'
import { MAX_PHOTO_BYTES, type SitesService } from './sites.service'

const PhotoParams = IdParamSchema.extend({ photoId: IdSchema })
const READERS = ACCESS.sites.read
const WRITERS = ACCESS.sites.write

export function sitesRouter(api: ApiRegistry, sites: SitesService) {
  const router = Router()
  const add = routesFor(router, api, 'Sites')
  add(
    {
      method: 'get',
      path: '/api/sites',
      response: z.array(SiteListItemSchema),
      summary:
        'Sites, last changed first, with search and filters; one page with limit and offset, the total matching in X-Total-Count',
      access: READERS,
      query: SiteListQuerySchema,
    },
    async ({ query, res }) => answerPage(res, await sites.page(query)),
  )
  add(
    {
      method: 'post',
      path: '/api/sites',
      response: SiteSchema,
      summary: 'Create a site',
      access: WRITERS,
      body: SiteInputSchema,
      status: 201,
    },
    ({ user, body }) => sites.create(user, body),
  )
  add(
    {
      method: 'get',
      path: '/api/sites/:id',
      response: SiteSchema,
      summary: 'One site',
      access: READERS,
      params: IdParamSchema,
    },
    ({ params }) => sites.get(params.id),
  )
  add(
    {
      method: 'put',
      path: '/api/sites/:id',
      response: SiteSchema,
      summary: 'Change a site',
      access: WRITERS,
      params: IdParamSchema,
      body: SiteInputSchema,
    },
    ({ user, params, body }) => sites.update(user, params.id, body),
  )
  add(
    {
      method: 'post',
      path: '/api/sites/:id/photos',
      response: SiteSchema,
      summary: 'Add a photo (multipart field "photo")',
      access: WRITERS,
      params: IdParamSchema,
      upload: 'photo',
      before: [singleUpload('photo', MAX_PHOTO_BYTES)],
      status: 201,
    },
    ({ user, params, req }) => sites.addPhoto(user, params.id, req.file),
  )
  add(
    {
      method: 'get',
      path: '/api/sites/:id/photos/:photoId',
      summary: 'A photo',
      access: READERS,
      params: PhotoParams,
      produces: 'image/*',
    },
    async ({ params, res }) => {
      const p = await sites.photo(params.id, params.photoId)
      res.type(p.contentType).set('cache-control', 'private, max-age=3600').send(p.bytes)
      return undefined
    },
  )
  return router
}
