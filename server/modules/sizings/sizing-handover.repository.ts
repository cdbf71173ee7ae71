import type { DataSource } from 'typeorm'
import type { DesignAcknowledgement, DesignCheck } from '../../../shared/schemas/design-checks'
import { SizingAcknowledgementEntity } from './sizing-acknowledgement.entity'
import { SizingEntity } from './sizing.entity'

export interface HandoverWrite {
  revision: number
  at: Date
  note: string
  /** present when the design fails checks: what failed, why it goes ahead, and who said so */
  acknowledgement?: { failedChecks: DesignCheck[]; reason: string; byId: number }
}

/** Lost the race: the sizing was no longer the draft at that revision. */
class NotHandedOver extends Error {}

/** The handover of a sizing and the acknowledgement of failed checks that may go with it. */
export function sizingHandoverRepository(ds: DataSource) {
  const acks = ds.getRepository(SizingAcknowledgementEntity)
  return {
    /**
     * Draft → submitted at the given revision, with its acknowledgement, in one transaction;
     * false (and nothing written) when the sizing is not that revision's draft any more.
     */
    async handOver(id: number, h: HandoverWrite): Promise<boolean> {
      try {
        await ds.transaction(async (em) => {
          // The state changes first: a concurrent handover waits on this row's lock and then
          // finds it submitted, instead of both first inserting an acknowledgement (which locks
          // the row shared through its foreign key) and then deadlocking on the update.
          const r = await em.update(
            SizingEntity,
            { id, state: 'draft', currentRevision: h.revision },
            {
              state: 'submitted',
              submittedAt: h.at,
              handoverNote: h.note,
              acknowledgementId: null,
            },
          )
          if (!r.affected) throw new NotHandedOver()
          const a = h.acknowledgement
          if (!a) return
          const saved = await em.save(
            em.create(SizingAcknowledgementEntity, {
              sizingId: id,
              revision: h.revision,
              failedChecks: a.failedChecks,
              reason: a.reason,
              acknowledgedById: a.byId,
              acknowledgedAt: h.at,
            }),
          )
          await em.update(SizingEntity, { id }, { acknowledgementId: saved.id })
        })
        return true
      } catch (e) {
        if (e instanceof NotHandedOver) return false
        throw e
      }
    },

    /** The stored acknowledgement with the name of who made it, as quotes freeze it. */
    async acknowledgement(ackId: number): Promise<DesignAcknowledgement | null> {
      const a = await acks.findOne({ where: { id: ackId }, relations: { acknowledgedBy: true } })
      if (!a) return null
      return {
        revision: a.revision,
        failed: a.failedChecks,
        reason: a.reason,
        at: a.acknowledgedAt.toISOString(),
        byName: a.acknowledgedBy?.name ?? '',
      }
    },
  }
}
export type SizingHandoverRepository = ReturnType<typeof sizingHandoverRepository>
