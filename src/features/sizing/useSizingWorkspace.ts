import { computed, ref, watch } from 'vue'
import type { HostModel } from '@shared/schemas/host-model'
import type { Site } from '@shared/schemas/site'
import { IdSchema } from '@shared/schemas/ids'
import { isApiError } from '@/api/client'
import { modelsApi } from '@/api/models'
import { sitesApi } from '@/api/sites'
import { sizingsApi, type SizingView } from '@/api/sizings'
import { useAction } from '@/composables/useAction'
import { useAuthStore } from '@/stores/auth'
import { useSizingDraftStore } from '@/features/sizing/draft-store'
import { formOf, newDraft, type SizingDraft } from '@/features/sizing/draft'

const keyOf = (id: number | null, siteId: number | null) =>
  id ? `sizing-${id}` : `new-site-${siteId}`

const FROM_A_SITE = 'A new sizing starts from a site: open the site, then start it there.'

/**
 * The site a new sizing starts from, as the address's `siteId` gives it (a bookmark or a reload
 * may have lost it or mangled it): its id, or why there is none, in the engineer's words.
 */
export function startingSite(query: unknown): { siteId: number } | { why: string } {
  if (query === null || query === undefined || query === '') return { why: FROM_A_SITE }
  const read = IdSchema.safeParse(query)
  if (read.success) return { siteId: read.data }
  const given = Array.isArray(query) ? query.join(', ') : String(query)
  return { why: `This address names no site ("${given}" is not a site number). ${FROM_A_SITE}` }
}

/**
 * Opening one sizing: the server's copy, the exact model revision it was sized on, and the copy
 * kept on this tablet when there is no connection. The draft lives in the store; saving is
 * `useSizingSave`, handing over `useSizingHandover`.
 */
export function useSizingWorkspace() {
  const store = useSizingDraftStore()
  const auth = useAuthStore()
  const site = ref<Site | null>(null)
  const saved = ref<SizingView | null>(null)
  /** the model as it is now on the server (its latest revision and the revision list) */
  const model = ref<HostModel | null>(null)
  const notice = ref('')
  /** why nothing is open once loading ended: no site to start from, or the server's refusal */
  const unopened = ref('')
  const draft = computed(() => store.current)
  const readOnly = computed(() => auth.role === 'sales' || saved.value?.state === 'submitted')
  watch(readOnly, (locked) => (store.locked = locked), { immediate: true })

  async function loadNew(siteId: number) {
    site.value = await sitesApi.get(siteId)
    const fresh = newDraft(siteId, new Date().toISOString())
    const latest = (await modelsApi.list(siteId))[0]
    model.value = latest ?? null
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
    const used = view.input.modelRevision
    const [m, s, revision] = await Promise.all([
      modelsApi.get(view.modelId),
      sitesApi.get(view.siteId),
      modelsApi.revision(view.modelId, used),
    ])
    site.value = s
    saved.value = view
    model.value = m
    const fresh: SizingDraft = {
      ...newDraft(view.siteId, view.updatedAt),
      key: keyOf(id, null),
      sizingId: id,
      sizingRevision: view.currentRevision,
      modelId: m.id,
      modelRevision: used,
      modelName: m.name,
      definition: revision.definition,
      structureChanged: false,
      form: formOf(view.input),
    }
    if (view.state === 'submitted' || auth.role === 'sales') store.discard(fresh.key)
    const local = store.open(fresh)
    if (local.changed && local.sizingRevision !== view.currentRevision)
      notice.value = `Your unsaved edits started from revision ${local.sizingRevision}; the server now has revision ${view.currentRevision}. When you save you will be asked which to keep.`
  }

  const opening = useAction(
    async (id: number | null, siteQuery: unknown) => {
      notice.value = ''
      unopened.value = ''
      const start = startingSite(siteQuery)
      const siteId = 'siteId' in start ? start.siteId : null
      try {
        if (id) await loadSaved(id)
        else if ('siteId' in start) await loadNew(start.siteId)
        else unopened.value = start.why
      } catch (e) {
        if (!isApiError(e) || e.code !== 'offline' || !store.openKept(keyOf(id, siteId))) throw e
        notice.value =
          'No connection: this is the copy kept on this tablet. Edits are kept here and sent when you are back online.'
      }
    },
    { failure: 'Could not open the sizing', latest: true },
  )
  /**
   * Opens the saved sizing `id`, else a new one on the site the address's `siteId` names (the
   * raw query value); when neither can open, `unopened` says why. Never waits without end.
   */
  const load = async (id: number | null, siteQuery: unknown) => {
    await opening.run(id, siteQuery)
    if (opening.error.value) unopened.value = opening.error.value
    if (unopened.value) store.currentKey = null // never show the sizing open before under this address
  }

  /** Moves the sizing onto another revision of its model (the engineer says so, never by itself). */
  async function useModelRevision(revision: number) {
    const d = draft.value
    if (!d?.modelId) return
    const r = await modelsApi.revision(d.modelId, revision)
    store.moveToRevision(r.definition, r.revision)
  }

  /** Reads the model again (after a calibration or a structure save made a revision). */
  async function refreshModel() {
    const id = draft.value?.modelId
    if (id) model.value = await modelsApi.get(id)
  }

  return {
    site,
    saved,
    model,
    draft,
    loading: opening.pending,
    notice,
    unopened,
    readOnly,
    load,
    useModelRevision,
    refreshModel,
  }
}
export type SizingWorkspace = ReturnType<typeof useSizingWorkspace>
