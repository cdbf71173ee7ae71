import { ref, watch } from 'vue'
import { ModelDefinitionSchema, SizingInputSchema } from '@shared/schemas/sizing'
import { isApiError } from '@/api/client'
import { modelsApi } from '@/api/models'
import { sizingsApi } from '@/api/sizings'
import { useAction } from '@/composables/useAction'
import type { FormErrors } from '@/forms/form-errors'
import { useSizingDraftStore } from '@/features/sizing/draft-store'
import { toSizingInput, type SizingDraft } from '@/features/sizing/draft'
import type { SizingWorkspace } from './useSizingWorkspace'
import { sizingConflict, structureConflict, type SyncConflict } from './sync-conflict'

type Step = (d: SizingDraft) => Promise<boolean>

const isConflict = (e: unknown) => isApiError(e) && e.code === 'revision-conflict'

/**
 * Saving the structure and the sizing. One action at a time (`run`, shared with the hand-over):
 * a double tap sends one request. A save that would overwrite a newer server revision is not
 * sent; the engineer is asked which version to keep (`conflict`). Without a connection the save
 * waits on the tablet and goes as soon as the browser is back online. A new sizing gets its id
 * here; the view moves to its address.
 */
export function useSizingSave(ws: SizingWorkspace, form: FormErrors) {
  const store = useSizingDraftStore()
  const conflict = ref<SyncConflict | null>(null)
  /** what the engineer asked for when a conflict stopped it, to do again once they decide */
  let asked: 'save' | 'saveModel' = 'save'

  async function saveStructure(d: SizingDraft): Promise<boolean> {
    if (d.modelId !== null && !d.structureChanged) return true
    if (!form.check(ModelDefinitionSchema, d.definition, 'definition')) return false
    if (d.modelId !== null && !d.revisionReason.trim()) {
      form.errors.value = { ...form.errors.value, reason: 'say why the model changed' }
      return false
    }
    try {
      const m =
        d.modelId === null
          ? await modelsApi.create({
              siteId: d.siteId,
              name: d.modelName || 'Host structure',
              definition: d.definition,
              reason: 'first version',
            })
          : await modelsApi.revise(d.modelId, {
              baseRevision: d.modelRevision ?? 1,
              definition: d.definition,
              reason: d.revisionReason,
            })
      Object.assign(d, { modelId: m.id, modelRevision: m.currentRevision, structureChanged: false })
      d.revisionReason = ''
      ws.model.value = m
      return true
    } catch (e) {
      if (!isConflict(e) || d.modelId === null) throw e
      conflict.value = await structureConflict(d)
      return false
    }
  }

  async function saveSizing(d: SizingDraft): Promise<boolean> {
    if (!(await saveStructure(d))) return false
    const input = toSizingInput(d)
    if (!form.check(SizingInputSchema, input, 'input')) return false
    try {
      const view = d.sizingId
        ? await sizingsApi.save(d.sizingId, d.sizingRevision ?? 1, input)
        : await sizingsApi.create(input)
      ws.saved.value = view
      Object.assign(d, { sizingRevision: view.currentRevision, changed: false, pendingSync: false })
      ws.notice.value = ''
      if (!d.sizingId) {
        d.sizingId = view.id
        store.rekey(d.key, `sizing-${view.id}`)
      }
      return true
    } catch (e) {
      if (!isConflict(e) || !d.sizingId) throw e
      conflict.value = await sizingConflict(d, input)
      return false
    }
  }

  const action = useAction(
    async (step: Step) => {
      const d = ws.draft.value
      if (!d) return false
      form.clear()
      store.syncing = true
      try {
        return await step(d)
      } catch (e) {
        if (!isApiError(e) || e.code !== 'offline') throw e
        d.pendingSync = true
        return false
      } finally {
        store.syncing = false
      }
    },
    { failure: 'Not done on the server', form },
  )

  const saveModel = () => {
    asked = 'saveModel'
    return action.run(saveStructure)
  }
  const save = () => {
    asked = 'save'
    return action.run(saveSizing)
  }

  /** Keeps the engineer's version: saved on top of the server's newer one, which stays in history. */
  async function keepMine() {
    const c = conflict.value
    const d = ws.draft.value
    if (!c || !d) return
    conflict.value = null
    if (c.kind === 'sizing') d.sizingRevision = c.serverRevision
    else d.modelRevision = c.serverRevision
    await (asked === 'save' ? save() : saveModel())
  }

  /** Takes the server's version and sets the edits on this tablet aside. */
  async function takeServer() {
    const c = conflict.value
    const d = ws.draft.value
    if (!c || !d) return
    conflict.value = null
    if (c.kind === 'structure') {
      if (d.modelId) await ws.useModelRevision(c.serverRevision)
      return
    }
    store.discard(d.key)
    await ws.load(d.sizingId, d.siteId)
  }

  // Back online with a save that could not go through: send it now.
  watch(
    () => store.online,
    (on) => {
      if (on && ws.draft.value?.pendingSync) void save()
    },
  )

  return {
    busy: action.pending,
    error: action.error,
    conflict,
    run: action.run,
    save,
    saveModel,
    keepMine,
    takeServer,
  }
}
export type SizingSave = ReturnType<typeof useSizingSave>
