import { computed, inject, provide, reactive, ref, type InjectionKey, type Ref } from 'vue'
import type { ZodType } from 'zod'
import { fieldErrors } from '@/api/client'
import { pathWords, peopleWords } from './messages'

/** A field whose text cannot be read: its value was not taken, so nothing may be sent. */
export interface Unreadable {
  label: string
  message: string
}

interface FormContext {
  errors: Ref<Record<string, string>>
  unreadable: Map<string, Unreadable>
}
const KEY: InjectionKey<FormContext> = Symbol('form-errors')

/**
 * The errors of one form, shared with its fields: each field shows the message of its own path
 * beside it. Fills from the shared zod schema before sending and from the API's 400 details.
 * @param labels names of fields for the summary, by path, where the words of the path are not enough
 */
export function provideFormErrors(labels: Record<string, string> = {}) {
  const errors = ref<Record<string, string>>({})
  const unreadable = reactive(new Map<string, Unreadable>())
  provide(KEY, { errors, unreadable })

  /** Validates with a shared schema; false (and the messages set) when it does not pass. */
  function check<T>(schema: ZodType<T>, value: unknown, prefix = ''): value is T {
    const r = schema.safeParse(value)
    if (r.success) return true
    const out: Record<string, string> = {}
    for (const i of r.error.issues) {
      const path = [prefix, ...i.path.map(String)].filter(Boolean).join('.')
      out[path] ??= peopleWords(i.message)
    }
    errors.value = { ...errors.value, ...out }
    return false
  }

  /** Puts a 400's field messages beside their fields; true when there were any. */
  function fromApi(e: unknown): boolean {
    const found = fieldErrors(e)
    errors.value = found
    return Object.keys(found).length > 0
  }

  /** The first field that cannot be read, as a sentence; '' when every field reads. */
  const blocking = computed(() => {
    const first = [...unreadable.values()][0]
    return first ? `${first.label}: ${first.message}` : ''
  })

  /** Every message as "Field: message", for a summary at the button. */
  const summary = computed(() =>
    Object.entries(errors.value).map(([p, m]) => `${pathWords(p, labels)}: ${m}`),
  )

  return {
    errors,
    unreadable,
    blocking,
    summary,
    check,
    fromApi,
    clear: () => (errors.value = {}),
  }
}
export type FormErrors = ReturnType<typeof provideFormErrors>

/** The message for one field path from the surrounding form, if any. */
export function useFieldError(path: () => string | undefined) {
  const ctx = inject(KEY, null)
  return computed(() => {
    const p = path()
    return p && ctx ? (ctx.errors.value[p] ?? '') : ''
  })
}

/** Where a field reports that its text cannot be read (a no-op outside a form). */
export function useUnreadableRegistry() {
  return inject(KEY, null)?.unreadable ?? null
}
