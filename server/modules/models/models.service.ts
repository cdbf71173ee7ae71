import { isDeepStrictEqual } from 'node:util'
import type {
  HostModel,
  ModelCreate,
  ModelRevise,
  ModelRevision,
} from '../../../shared/schemas/host-model'
import type { ModelDefinition } from '../../../shared/schemas/sizing'
import { AppError, forbidden, notFound } from '../../http/app-error'
import type { AuthUser } from '../../middleware/authenticate'
import type { SitesService } from '../sites/sites.service'
import { checkModel } from './check-model'
import type { ModelsRepository } from './models.repository'

export function modelsService(deps: { models: ModelsRepository; sites: SitesService }) {
  async function get(id: number): Promise<HostModel> {
    const m = await deps.models.findById(id)
    if (!m) throw notFound('model')
    return m
  }

  return {
    get,
    /** The site a model belongs to (404 when there is no such model), without its content. */
    async siteOf(id: number): Promise<number> {
      const siteId = await deps.models.siteIdOf(id)
      if (siteId === null) throw notFound('model')
      return siteId
    },
    list: (siteId?: number) => deps.models.list(siteId),

    async create(user: AuthUser, input: ModelCreate) {
      await deps.sites.get(input.siteId)
      checkModel(input.definition)
      return get(await deps.models.create({ ...input, ownerId: user.id }))
    },

    /**
     * A new revision from the one the engineer started on. Repeating the same save (a retry
     * after a dropped connection) returns the revision already made instead of a second one.
     */
    async revise(user: AuthUser, id: number, input: ModelRevise) {
      const model = await get(id)
      if (user.role !== 'admin' && model.ownerId !== user.id)
        throw forbidden('Only the engineer who made this model may change it.')
      checkModel(input.definition)
      if (
        await deps.models.addRevision(
          id,
          input.baseRevision,
          input.definition,
          input.reason,
          user.id,
        )
      )
        return get(id)
      const latest = await get(id)
      if (
        latest.currentRevision === input.baseRevision + 1 &&
        isDeepStrictEqual(latest.definition, input.definition)
      )
        return latest
      throw new AppError(
        'revision-conflict',
        `The model is at revision ${latest.currentRevision}; reload it before saving.`,
        409,
        {
          currentRevision: latest.currentRevision,
        },
      )
    },

    /** A revision as it was stored, for a sizing that still uses it; 404 when there is none. */
    async revision(modelId: number, revision: number): Promise<ModelRevision> {
      await get(modelId)
      const r = await deps.models.revisionAt(modelId, revision)
      if (!r) throw notFound('model-revision')
      return r
    },

    async definitionAt(modelId: number, revision: number): Promise<ModelDefinition> {
      const d = await deps.models.definitionAt(modelId, revision)
      if (!d)
        throw new AppError(
          'model-revision-not-found',
          `Model ${modelId} has no revision ${revision}.`,
          400,
          [{ path: 'body.modelRevision', message: 'no such revision' }],
        )
      return d
    },
  }
}
export type ModelsService = ReturnType<typeof modelsService>
