import type { DataSource } from 'typeorm'
import type { HostModel, ModelRevision } from '../../../shared/schemas/host-model'
import type { ModelDefinition } from '../../../shared/schemas/sizing'
import { HostModelEntity } from './host-model.entity'
import { ModelRevisionEntity } from './model-revision.entity'

export function modelsRepository(ds: DataSource) {
  const models = ds.getRepository(HostModelEntity)
  const revisions = ds.getRepository(ModelRevisionEntity)

  async function definitionAt(modelId: number, revision: number) {
    const r = await revisions.findOneBy({ modelId, revision })
    return r?.definition ?? null
  }

  /**
   * Models with their current definitions and the lists of their revisions (not their content),
   * in two queries whatever the number of models.
   */
  async function hydrate(ms: HostModelEntity[]): Promise<HostModel[]> {
    if (!ms.length) return []
    const ids = ms.map((m) => m.id)
    const revs = await revisions
      .createQueryBuilder('r')
      // Only what the list shows: a model edited often would otherwise parse every definition.
      .select(['r.id', 'r.modelId', 'r.revision', 'r.reason', 'r.createdAt'])
      // Only the author's name is read, from the users table the users module owns.
      .leftJoin('users', 'u', 'u.id = r.createdById')
      .addSelect('u.name', 'createdByName')
      .where('r.modelId IN (:...ids)', { ids })
      .orderBy('r.modelId', 'ASC')
      .addOrderBy('r.revision', 'ASC')
      .getRawAndEntities()
    const current = await revisions
      .createQueryBuilder('r')
      .select(['r.id', 'r.modelId', 'r.definition'])
      .innerJoin(HostModelEntity, 'm', 'm.id = r.modelId AND m.currentRevision = r.revision')
      .where('r.modelId IN (:...ids)', { ids })
      .getMany()
    const definitionOf = new Map(current.map((r) => [r.modelId, r.definition]))
    const listed = new Map<number, HostModel['revisions']>(ids.map((id) => [id, []]))
    revs.entities.forEach((r, i) =>
      listed.get(r.modelId)?.push({
        revision: r.revision,
        reason: r.reason,
        createdAt: r.createdAt.toISOString(),
        createdByName: String((revs.raw[i] as { createdByName?: string }).createdByName ?? ''),
      }),
    )
    return ms.map((m) => ({
      id: m.id,
      siteId: m.siteId,
      siteName: m.site?.name ?? '',
      name: m.name,
      ownerId: m.ownerId,
      ownerName: m.owner?.name ?? '',
      currentRevision: m.currentRevision,
      definition: definitionOf.get(m.id) as ModelDefinition,
      revisions: listed.get(m.id) ?? [],
      updatedAt: m.updatedAt.toISOString(),
    }))
  }

  return {
    async findById(id: number) {
      const m = await models.findOne({ where: { id }, relations: { site: true, owner: true } })
      return m ? ((await hydrate([m]))[0] ?? null) : null
    },
    async list(siteId?: number) {
      const rows = await models.find({
        where: siteId ? { siteId } : {},
        relations: { site: true, owner: true },
        order: { updatedAt: 'DESC', id: 'DESC' },
      })
      return hydrate(rows)
    },
    definitionAt,
    async siteIdOf(id: number): Promise<number | null> {
      const m = await models.findOne({ where: { id }, select: { id: true, siteId: true } })
      return m?.siteId ?? null
    },
    /** One revision with who made it and why; null when the model has no such revision. */
    async revisionAt(modelId: number, revision: number): Promise<ModelRevision | null> {
      const { entities, raw } = await revisions
        .createQueryBuilder('r')
        .leftJoin('users', 'u', 'u.id = r.createdById')
        .addSelect('u.name', 'createdByName')
        .where('r.modelId = :modelId AND r.revision = :revision', { modelId, revision })
        .getRawAndEntities()
      const r = entities[0]
      if (!r) return null
      return {
        modelId,
        revision: r.revision,
        reason: r.reason,
        createdAt: r.createdAt.toISOString(),
        createdByName: String((raw[0] as { createdByName?: string }).createdByName ?? ''),
        definition: r.definition,
      }
    },
    async create(data: {
      siteId: number
      ownerId: number
      name: string
      definition: ModelDefinition
      reason: string
    }) {
      return ds.transaction(async (em) => {
        const m = await em.save(
          em.create(HostModelEntity, {
            siteId: data.siteId,
            ownerId: data.ownerId,
            name: data.name,
            currentRevision: 1,
          }),
        )
        await em.save(
          em.create(ModelRevisionEntity, {
            modelId: m.id,
            revision: 1,
            definition: data.definition,
            reason: data.reason,
            createdById: data.ownerId,
          }),
        )
        return m.id
      })
    },
    /**
     * Adds revision base+1 only while base is still the current one; the conditional update
     * makes two concurrent saves of the same base produce one revision.
     */
    async addRevision(
      modelId: number,
      base: number,
      definition: ModelDefinition,
      reason: string,
      userId: number,
    ) {
      return ds.transaction(async (em) => {
        const moved = await em.update(
          HostModelEntity,
          { id: modelId, currentRevision: base },
          { currentRevision: base + 1 },
        )
        if (!moved.affected) return false
        await em.save(
          em.create(ModelRevisionEntity, {
            modelId,
            revision: base + 1,
            definition,
            reason,
            createdById: userId,
          }),
        )
        return true
      })
    },
  }
}
export type ModelsRepository = ReturnType<typeof modelsRepository>
