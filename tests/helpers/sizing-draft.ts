import { createPinia, setActivePinia } from 'pinia'
import type { CurrentUser } from '../../shared/schemas/auth'
import { newDraft } from '../../src/features/sizing/draft'
import { useSizingDraftStore } from '../../src/features/sizing/draft-store'
import { useAuthStore } from '../../src/stores/auth'

/** An engineer of the supplier (no customer company). */
export const engineer = (id: number): CurrentUser => ({
  id,
  email: `engineer${id}@example.test`,
  name: `Engineer ${id}`,
  role: 'engineer',
  companyId: null,
  companyName: null,
})

/**
 * A fresh app state (its own Pinia, made active) signed in as engineer `userId`, with the draft
 * of a new sizing on site `siteId` open in the draft store.
 */
export function openNewDraft(userId: number, siteId: number) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useAuthStore().user = engineer(userId)
  const store = useSizingDraftStore()
  store.open(newDraft(siteId, '2026-01-05T08:00:00.000Z'))
  return { pinia, store }
}
