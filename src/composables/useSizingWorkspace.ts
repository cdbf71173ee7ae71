import { computed, ref, watch } from 'vue'
import type { Site } from '@shared/schemas/site'
import { fieldErrors, isApiError } from '@/api/client'
import { modelsApi } from '@/api/models'
import { sitesApi } from '@/api/sites'
import { sizingsApi, type HandoverRequest, type SizingView } from '@/api/sizings'
import { useErrorToast } from '@/composables/useErrorToast'
import { router } from '@/router'
import { useAuthStore } from '@/stores/auth'
import { useSizingDraftStore } from '@/stores/sizingDraft'
import { formOf, newDraft, toSizingInput, type SizingDraft } from '@/stores/sizing-form'

/** Loading, saving, handing over and reopening one sizing; the draft lives in the store. */
export function useSizingWorkspace() {
  const store = useSizingDraftStore()
  const auth = useAuthStore()
  const showError = useErrorToast()
  const site = ref<Site | null>(null)
  const saved = ref<SizingView | null>(null)
  const loading = ref(false)
  const busy = ref(false)
  const errors = ref<Record<string, string>>({})
  const notice = ref('')
  const draft = computed(() => store.current)
  const readOnly = computed(() => auth.role === 'sales' || saved.value?.state === 'submitted')

  async function loadNew(siteId: number) {
    site.value = await sitesApi.get(siteId)
    const fresh = newDraft(siteId, new Date().toISOString())
    const latest = (await modelsApi.list(siteId))[0]
    if (latest) {
      Object.assign(fresh, {
        modelId: latest.id,
        modelRevision: latest.currentRevision,
        modelName: latest.name,
        definition: latest.definition,
        structureChanged: false,
      })
    }
    saved.value = null
    store.open(fresh)
  }

  async function loadSaved(id: number) {
    const view = await sizingsApi.get(id)
    const [model, s] = await Promise.all([modelsApi.get(view.modelId), sitesApi.get(view.siteId)])
    site.value = s
    saved.value = view
    notice.value =
      model.currentRevision === view.input.modelRevision
        ? ''
        : `The model is at revision ${model.currentRevision}; this sizing used revision ${view.input.modelRevision}. The preview uses the latest.`
    const fresh: SizingDraft = {
      ...newDraft(view.siteId, view.updatedAt),
      key: `sizing-${id}`,
      sizingId: id,
      sizingRevision: view.currentRevision,
      modelId: model.id,
      modelRevision: model.currentRevision,
      modelName: model.name,
      definition: model.definition,
      structureChanged: false,
      form: formOf(view.input),
    }
    if (view.state === 'submitted' || auth.role === 'sales') store.discard(fresh.key)
    const local = store.open(fresh)
    if (local.changed && local.sizingRevision !== view.currentRevision)
      notice.value = `Your unsaved edits started from revision ${local.sizingRevision}; the server has revision ${view.currentRevision}. Saving will be refused: reload to start again.`
  }

  async function load(id: number | null, siteId: number | null) {
    loading.value = true
    try {
      if (id) await loadSaved(id)
      else if (siteId) await loadNew(siteId)
    } catch (e) {
      showError(e, 'Could not open the sizing')
    } finally {
      loading.value = false
    }
  }

  /** Creates the model or a new revision when the structure changed; false if refused. */
  async function saveStructure(d: SizingDraft): Promise<boolean> {
    if (d.modelId !== null && !d.structureChanged) return true
    if (d.modelId !== null && !d.revisionReason.trim()) {
      errors.value = { reason: 'say why the model changed' }
      return false
    }
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
    d.modelId = m.id
    d.modelRevision = m.currentRevision
    d.structureChanged = false
    d.revisionReason = ''
    return true
  }

  async function guarded(work: (d: SizingDraft) => Promise<boolean>, failure: string) {
    const d = draft.value
    if (!d || busy.value) return false
    busy.value = true
    store.syncing = true
    errors.value = {}
    try {
      return await work(d)
    } catch (e) {
      if (isApiError(e) && e.code === 'offline') d.pendingSync = true
      else {
        errors.value = fieldErrors(e)
        showError(e, failure)
      }
      return false
    } finally {
      busy.value = false
      store.syncing = false
    }
  }

  const saveModel = () => guarded(saveStructure, 'Structure not saved')

  const save = () =>
    guarded(async (d) => {
      if (!(await saveStructure(d))) return false
      const input = toSizingInput(d)
      const view = d.sizingId
        ? await sizingsApi.save(d.sizingId, d.sizingRevision ?? 1, input)
        : await sizingsApi.create(input)
      saved.value = view
      Object.assign(d, { sizingRevision: view.currentRevision, changed: false, pendingSync: false })
      if (!d.sizingId) {
        d.sizingId = view.id
        store.rekey(d.key, `sizing-${view.id}`)
        await router.replace({ name: 'sizing', params: { id: view.id } })
      }
      return true
    }, 'Not saved')

  const submit = (h: HandoverRequest) =>
    guarded(async (d) => {
      if (!d.sizingId || d.changed) return false
      const id = d.sizingId
      saved.value = await sizingsApi.submit(id, d.sizingRevision ?? 1, h).catch(async (e) => {
        // The checks changed on the server (the catalogue, say): show them as they are now.
        if (isApiError(e) && e.code === 'design-checks-failed')
          saved.value = await sizingsApi.get(id)
        throw e
      })
      return true
    }, 'Not handed over')

  const reopen = () =>
    guarded(async (d) => {
      if (!d.sizingId) return false
      saved.value = await sizingsApi.reopen(d.sizingId)
      return true
    }, 'Not reopened')

  // Back online with a save that could not go through: send it now.
  watch(
    () => store.online,
    (on) => {
      if (on && draft.value?.pendingSync) void save()
    },
  )

  return {
    site,
    saved,
    draft,
    loading,
    busy,
    errors,
    notice,
    readOnly,
    load,
    save,
    saveModel,
    submit,
    reopen,
  }
}
