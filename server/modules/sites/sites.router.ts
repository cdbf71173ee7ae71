import { z } from 'zod'
import { SiteListItemSchema, SiteSchema } from '../../../shared/schemas/site'
import { ACCESS } from '../../../shared/access'
import { IdParamSchema, IdSchema } from '../../../shared/schemas/ids'
import { SiteInputSchema, SiteListQuerySchema } from '../../../shared/schemas/site'
import type { ApiRegistry } from '../../http/api-registry'
import { answerPage } from '../../http/page'
import { routeTable } from '../../http/route-table'
import { singleUpload } from '../../http/upload'
import { MAX_PHOTO_BYTES, type SitesService } from './sites.service'

const PhotoParams = IdParamSchema.extend({ photoId: IdSchema })

export function sitesRouter(api: ApiRegistry, sites: SitesService) {
  const routes = routeTable(api, 'Sites', ACCESS.sites)
  routes.get('/api/sites', {
    summary:
      'Sites, last changed first, with search and filters; one page with limit and offset, the total matching in X-Total-Count',
    response: z.array(SiteListItemSchema),
    query: SiteListQuerySchema,
    answer: async ({ query, res }) => answerPage(res, await sites.page(query)),
  })
  routes.post('/api/sites', {
    summary: 'Create a site',
    response: SiteSchema,
    body: SiteInputSchema,
    status: 201,
    answer: ({ user, body }) => sites.create(user, body),
  })
  routes.get('/api/sites/:id', {
    summary: 'One site',
    response: SiteSchema,
    params: IdParamSchema,
    answer: ({ params }) => sites.get(params.id),
  })
  routes.put('/api/sites/:id', {
    summary: 'Change a site',
    response: SiteSchema,
    params: IdParamSchema,
    body: SiteInputSchema,
    answer: ({ user, params, body }) => sites.update(user, params.id, body),
  })
  routes.post('/api/sites/:id/photos', {
    summary: 'Add a photo (multipart field "photo")',
    response: SiteSchema,
    params: IdParamSchema,
    upload: 'photo',
    before: [singleUpload('photo', MAX_PHOTO_BYTES)],
    status: 201,
    answer: ({ user, params, req }) => sites.addPhoto(user, params.id, req.file),
  })
  routes.get('/api/sites/:id/photos/:photoId', {
    summary: 'A photo',
    params: PhotoParams,
    produces: 'image/*',
    answer: async ({ params, res }) => {
      const p = await sites.photo(params.id, params.photoId)
      res.type(p.contentType).set('cache-control', 'private, max-age=3600').send(p.bytes)
      return undefined
    },
  })
  return routes.router
}
