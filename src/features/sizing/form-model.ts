import { computed } from 'vue'
import type { SizingForm } from './draft'
import { useSizingDraftStore } from './draft-store'

/**
 * One choice of the form a step shows, for `v-model` on a field: it reads `form` and writes
 * through the store's `setChoices`; `undefined` clears an optional choice.
 */
export function formModel<K extends keyof SizingForm>(form: () => SizingForm, key: K) {
  const store = useSizingDraftStore()
  return computed({
    get: () => form()[key],
    set: (value: SizingForm[K]) => store.setChoices({ [key]: value } as Partial<SizingForm>),
  })
}
