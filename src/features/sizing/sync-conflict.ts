import type { ModelDefinition, SizingInput } from '@shared/schemas/sizing'
import { modelsApi } from '@/api/models'
import { sizingsApi } from '@/api/sizings'
import { pathWords } from '@/forms/messages'
import type { SizingDraft } from '@/features/sizing/draft'

/** A save that would overwrite a newer revision on the server; the engineer decides. */
export interface SyncConflict {
  kind: 'sizing' | 'structure'
  /** the revision now on the server */
  serverRevision: number
  /** who made it, when or why */
  detail: string
  /** what differs between the tablet's version and the server's, in words */
  differences: string[]
}

const LABELS: Record<string, string> = {
  targetMode: 'Target mode',
  absorberNode: 'Attachment node',
  excitationNode: 'Excitation node',
  responseNode: 'Response node',
  forceAmplitude: 'Design force',
  loadPresetId: 'Load',
  acceptance: 'Acceptance limit',
  band: 'Frequency band',
  records: 'Linked site records',
  modelRevision: 'Model revision used',
  hostDampingRatio: 'Host damping',
}

/** Deep equality of JSON values, whatever the order of object keys. */
function same(a: unknown, b: unknown): boolean {
  if (a === b) return true
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false
  if (Array.isArray(a) !== Array.isArray(b)) return false
  const ka = Object.keys(a).filter((k) => (a as Record<string, unknown>)[k] !== undefined)
  const kb = Object.keys(b).filter((k) => (b as Record<string, unknown>)[k] !== undefined)
  return (
    ka.length === kb.length &&
    ka.every((k) => same((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]))
  )
}

function differing(a: object, b: object): string[] {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)])
  return [...keys]
    .filter((k) => !same((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]))
    .map((k) => pathWords(k, LABELS))
}

export async function sizingConflict(d: SizingDraft, mine: SizingInput): Promise<SyncConflict> {
  const server = await sizingsApi.get(d.sizingId as number)
  return {
    kind: 'sizing',
    serverRevision: server.currentRevision,
    detail: `revision ${server.currentRevision}, saved ${new Date(server.updatedAt).toLocaleString('en-GB')}`,
    differences: differing(mine, server.input),
  }
}

export async function structureConflict(d: SizingDraft): Promise<SyncConflict> {
  const m = await modelsApi.get(d.modelId as number)
  const last = m.revisions[m.revisions.length - 1]
  const mine: ModelDefinition = d.definition
  return {
    kind: 'structure',
    serverRevision: m.currentRevision,
    detail: `revision ${m.currentRevision}${last ? ` by ${last.createdByName}: ${last.reason}` : ''}`,
    differences: differing(mine, m.definition),
  }
}
