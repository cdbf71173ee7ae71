import { defineStore } from 'pinia'
import { computed, ref, watch } from 'vue'
import { useAuthStore } from '@/stores/auth'
import type { SizingDraft } from './draft'

/** Drafts are kept per user, so a tablet passed to a colleague never shows the previous user's. */
const storageKey = (userId: number | undefined) => `quellnode.sizingDrafts.${userId ?? 'none'}`

export type SyncState = 'saved' | 'unsaved' | 'offline' | 'syncing'

function load(key: string): Record<string, SizingDraft> {
  try {
    const raw = localStorage.getItem(key)
    const all = raw ? (JSON.parse(raw) as Record<string, SizingDraft>) : {}
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
 */
export const useSizingDraftStore = defineStore('sizingDraft', () => {
  const auth = useAuthStore()
  const drafts = ref<Record<string, SizingDraft>>(load(storageKey(auth.user?.id)))
  const currentKey = ref<string | null>(null)
  const online = ref(typeof navigator === 'undefined' ? true : navigator.onLine)
  const syncing = ref(false)

  if (typeof window !== 'undefined') {
    window.addEventListener('online', () => (online.value = true))
    window.addEventListener('offline', () => (online.value = false))
  }

  watch(
    () => auth.user?.id,
    (id) => {
      drafts.value = load(storageKey(id))
      currentKey.value = null
    },
  )

  watch(
    drafts,
    (all) => {
      if (!auth.user) return
      try {
        localStorage.setItem(storageKey(auth.user.id), JSON.stringify(all))
      } catch {
        // storage full or blocked: the draft still lives in memory for this page
      }
    },
    { deep: true },
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

  /** Applies an edit to the current draft and marks it unsaved. */
  function edit(change: (d: SizingDraft) => void) {
    const d = current.value
    if (!d) return
    change(d)
    d.changed = true
    d.updatedAt = new Date().toISOString()
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
    state,
    open,
    openKept,
    edit,
    rekey,
    discard,
  }
})
