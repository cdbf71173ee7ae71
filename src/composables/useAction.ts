import { ref, type Ref } from 'vue'
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
  /**
   * A new call runs even while one is pending (a list reloaded as a search is typed); only the
   * latest call's answer is returned, an earlier one's is dropped (undefined).
   */
  latest?: boolean
  /**
   * How long `pending` stays true after the answer (ms): the button that takes the tapped one's
   * place then ignores the second tap of a double tap.
   */
  settleMs?: number
}

/** What went wrong, in the server's words when it gave them. */
export function messageOf(e: unknown): string {
  return isApiError(e) ? e.message : 'Unexpected error; try again.'
}

/**
 * One way to run what a button asks the server for: while it runs `pending` is true and a second
 * call (a double tap) is ignored, so one tap makes one request; a 400 puts its messages beside
 * the fields of `form`, other failures go to a toast or `error`, and a lapsed session
 * (401) goes to the sign-in page and back. Loading a page's data goes through it as well, so a
 * failed load is shown, never an empty list that looks like no data.
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
  let calls = 0

  async function fail(e: unknown) {
    if (isApiError(e) && e.status === 401 && e.code === 'not-signed-in') {
      auth.forget()
      await router.push({ name: 'sign-in', query: { next: router.currentRoute.value.fullPath } })
      return
    }
    const onFields = options.form?.fromApi(e) ?? false
    error.value = onFields ? 'Check the values marked in red.' : messageOf(e)
    if (options.failure)
      toast.add({ severity: 'error', summary: options.failure, detail: error.value, life: 6000 })
  }

  /** Runs the work unless it is already running; undefined when refused or failed. */
  async function run(...args: A): Promise<R | undefined> {
    if (pending.value && !options.latest) return undefined
    const blocking = options.form?.blocking.value
    if (blocking) {
      error.value = `Not sent: ${blocking}`
      return undefined
    }
    const mine = ++calls
    pending.value = true
    error.value = ''
    try {
      const result = await work(...args)
      return mine === calls ? result : undefined
    } catch (e) {
      if (mine === calls) await fail(e)
      return undefined
    } finally {
      const settle = () => mine === calls && (pending.value = false)
      if (options.settleMs) setTimeout(settle, options.settleMs)
      else settle()
    }
  }

  return { run, pending, error }
}

/**
 * What a page shows, loaded through `useAction`: a failed load is shown in a toast (never an
 * empty list that looks like no data) and the latest load wins when filters change quickly.
 * @param fetch the request(s)
 * @param initial what `data` holds until the first answer
 * @param failure the heading of the toast when loading fails
 */
export function useLoad<T>(fetch: () => Promise<T>, initial: T, failure: string) {
  const data = ref(initial) as Ref<T>
  const action = useAction(fetch, { failure, latest: true })
  async function load() {
    const found = await action.run()
    if (found !== undefined) data.value = found
    return found
  }
  return { data, loading: action.pending, error: action.error, load }
}
