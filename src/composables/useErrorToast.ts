import { useToast } from 'primevue/usetoast'
import { isApiError } from '@/api/client'

/** Shows a failed call as a toast with the server's own message. */
export function useErrorToast() {
  const toast = useToast()
  return (e: unknown, summary = 'That did not work') => {
    const detail = isApiError(e) ? e.message : 'Unexpected error; try again.'
    toast.add({ severity: 'error', summary, detail, life: 6000 })
  }
}
