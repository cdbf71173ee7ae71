import { ref } from 'vue'
import { useRouter } from 'vue-router'
import { useToast } from 'primevue/usetoast'
import { isApiError } from '@/api/client'
import type { FormErrors } from '@/forms/form-errors'
import { useAuthStore } from '@/stores/auth'

export interface ActionOptions {
  /** the heading of the toast when it fails; without it the message goes to `error` only */
  failure?: string
  /** the form whose fields show a 400's messages and which must read before sending */
  form?: FormErrors
}

/**
 * One way to run what a button asks the server for: while it runs `pending` is true and a second
 * call (a double tap) is ignored, so one tap makes one request; a 400 puts its messages beside
 * the fields of `form`, other failures go to a toast or `error`, and a lapsed session
 * (401) goes to the sign-in page and back.
 * @param work the request(s); its result is returned by `run`
 */
export function useAction<A extends unknown[], R>(
  work: (...args: A) => Promise<R>,
  options: ActionOptions = {},
) {
  const pending = ref(false)
  const error = ref('')
  const toast = useToast()
  const router = useRouter()
  const auth = useAuthStore()

  async function fail(e: unknown) {
    if (isApiError(e) && e.status === 401 && e.code === 'not-signed-in') {
      auth.forget()
      await router.push({ name: 'sign-in', query: { next: router.currentRoute.value.fullPath } })
      return
    }
    const onFields = options.form?.fromApi(e) ?? false
    const message = isApiError(e) ? e.message : 'Unexpected error; try again.'
    error.value = onFields ? 'Check the values marked in red.' : message
    if (options.failure)
      toast.add({ severity: 'error', summary: options.failure, detail: error.value, life: 6000 })
  }

  /** Runs the work unless it is already running; undefined when refused or failed. */
  async function run(...args: A): Promise<R | undefined> {
    if (pending.value) return undefined
    const blocking = options.form?.blocking.value
    if (blocking) {
      error.value = `Not sent: ${blocking}`
      return undefined
    }
    pending.value = true
    error.value = ''
    try {
      return await work(...args)
    } catch (e) {
      await fail(e)
      return undefined
    } finally {
      pending.value = false
    }
  }

  return { run, pending, error }
}
