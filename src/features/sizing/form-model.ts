import { computed, type WritableComputedRef } from 'vue'
import type { SizingForm } from './draft'
import { useSizingDraftStore } from './draft-store'

/**
 * One field of a value a store action edits, for `v-model`: it reads `read()[key]` and writes
 * `{ [key]: value }` through `write` (a value of undefined clears an optional field).
 */
export function fieldModel<T, K extends keyof T>(
  read: () => T,
  key: K,
  write: (change: Partial<T>) => void,
) {
  return computed({
    get: () => read()[key],
    set: (value: T[K]) => write({ [key]: value } as unknown as Partial<T>),
  })
}

/** `fieldModel` for several fields of one value: `{ [key]: model }`, to destructure. */
export function fieldModels<T, K extends keyof T>(
  read: () => T,
  keys: readonly K[],
  write: (change: Partial<T>) => void,
) {
  const models = keys.map((key) => [key, fieldModel(read, key, write)] as const)
  return Object.fromEntries(models) as { [P in K]: WritableComputedRef<T[P]> }
}

/**
 * One choice of the form a step shows, for `v-model` on a field: it reads `form` and writes
 * through the store's `setChoices` (ignored on a read-only sizing).
 */
export function formModel<K extends keyof SizingForm>(form: () => SizingForm, key: K) {
  const store = useSizingDraftStore()
  return fieldModel(form, key, store.setChoices)
}
