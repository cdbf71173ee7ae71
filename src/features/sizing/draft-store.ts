import { defineStore } from 'pinia'
import { computed, ref, watch } from 'vue'
import { useLocalStorage, useOnline } from '@vueuse/core'
import { useAuthStore } from '@/stores/auth'
import type { SizingDraft } from './draft'
import { draftActions } from './draft-actions'

/** Drafts are kept per user, so a tablet passed to a colleague never shows the previous user's. */
const storageKey = (userId: number | undefined) => `quellnode.sizingDrafts.${userId ?? 'none'}`

export type SyncState = 'saved' | 'unsaved' | 'offline' | 'syncing'

/** Reads the kept drafts; a copy that does not parse is left out rather than stop the page. */
function readDrafts(raw: string): Record<string, SizingDraft> {
  try {
    const all = JSON.parse(raw) as Record<string, SizingDraft>
    // drafts kept before records could be linked
    for (const d of Object.values(all)) d.form.records ??= []
    return all
  } catch {
    return {}
  }
}

/**
 * Sizings in progress, kept in localStorage so a dropped connection or a closed tab on site
 * loses nothing; the server copy is written when the engineer saves (or when back online).
 * Edits go through the named actions of `draftActions`.
 */
export const useSizingDraftStore = defineStore('sizingDraft', () => {
  const auth = useAuthStore()
  const drafts = useLocalStorage<Record<string, SizingDraft>>(
    () => storageKey(auth.user?.id),
    {},
    {
      writeDefaults: false,
      serializer: { read: readDrafts, write: (v) => JSON.stringify(v) },
      // storage full or blocked: the draft still lives in memory for this page
      onError: () => undefined,
    },
  )
  const currentKey = ref<string | null>(null)
  const online = useOnline()
  const syncing = ref(false)
  /** the sizing open is read-only (handed over, or opened by sales): edits are ignored */
  const locked = ref(false)

  watch(
    () => auth.user?.id,
    () => (currentKey.value = null),
  )

  const current = computed(() => (currentKey.value ? drafts.value[currentKey.value] : undefined))

  const state = computed<SyncState>(() => {
    const d = current.value
    if (syncing.value) return 'syncing'
    if (d?.pendingSync || (!online.value && d?.changed)) return 'offline'
    return d?.changed ? 'unsaved' : 'saved'
  })

  /** Makes a draft current: an unsaved local one wins over the fresh copy given. */
  function open(fresh: SizingDraft) {
    const local = drafts.value[fresh.key]
    if (!local || !local.changed) drafts.value[fresh.key] = fresh
    currentKey.value = fresh.key
    return drafts.value[fresh.key] as SizingDraft
  }

  /** Makes the copy kept on this device current (no connection); false when there is none. */
  function openKept(key: string) {
    if (!drafts.value[key]) return false
    currentKey.value = key
    return true
  }

  /** Moves a draft to a new key (a new sizing got its id from the server). */
  function rekey(from: string, to: string) {
    const d = drafts.value[from]
    if (!d) return
    delete drafts.value[from]
    drafts.value[to] = { ...d, key: to }
    if (currentKey.value === from) currentKey.value = to
  }

  function discard(key: string) {
    delete drafts.value[key]
  }

  return {
    drafts,
    current,
    currentKey,
    online,
    syncing,
    locked,
    state,
    open,
    openKept,
    rekey,
    discard,
    ...draftActions(current, locked),
  }
})
