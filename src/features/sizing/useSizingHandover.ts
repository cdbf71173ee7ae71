import { isApiError } from '@/api/client'
import { sizingsApi, type HandoverRequest } from '@/api/sizings'
import type { SizingWorkspace } from './useSizingWorkspace'
import type { SizingSave } from './useSizingSave'

/** Handing a saved sizing over to sales, and taking it back; through the save's one-at-a-time run. */
export function useSizingHandover(ws: SizingWorkspace, saving: SizingSave) {
  const submit = (h: HandoverRequest) =>
    saving.run(async (d) => {
      if (!d.sizingId || d.changed) return false
      const id = d.sizingId
      ws.saved.value = await sizingsApi.submit(id, d.sizingRevision ?? 1, h).catch(async (e) => {
        // The checks changed on the server (the catalogue, say): show them as they are now.
        if (isApiError(e) && e.code === 'design-checks-failed')
          ws.saved.value = await sizingsApi.get(id)
        throw e
      })
      return true
    })

  const reopen = () =>
    saving.run(async (d) => {
      if (!d.sizingId) return false
      ws.saved.value = await sizingsApi.reopen(d.sizingId)
      return true
    })

  return { submit, reopen }
}
