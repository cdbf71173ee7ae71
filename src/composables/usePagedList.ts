import { computed, ref } from 'vue'
import type { Page } from '@/api/client'
import { useLoad } from './useAction'

/** Rows per page of the office lists. */
export const LIST_PAGE = 25

/**
 * One page of a server-paged list at a time (limit/offset, the total from X-Total-Count), loaded
 * through `useLoad`: the filters live in the server's query, so the page is always one the server
 * chose. Bind `first`, `rows`, `total` and `onPage` to a lazy DataTable's paginator.
 * @param fetch the page for a limit and offset, with the caller's filters
 * @param failure the heading of the toast when loading fails
 */
export function usePagedList<T>(
  fetch: (page: { limit: number; offset: number }) => Promise<Page<T>>,
  failure: string,
) {
  const first = ref(0)
  const rows = LIST_PAGE
  const { data, loading, load } = useLoad(
    () => fetch({ limit: rows, offset: first.value }),
    { items: [] as T[], total: 0 },
    failure,
  )
  /** back to the first page: the filters changed */
  function reload() {
    first.value = 0
    return load()
  }
  function onPage(e: { first: number }) {
    first.value = e.first
    void load()
  }
  const items = computed(() => data.value.items)
  const total = computed(() => data.value.total)
  return { items, total, first, rows, loading, load, reload, onPage }
}

/** What `usePagedList` gives: the page shown and the paginator's bindings. */
export type PagedList<T> = ReturnType<typeof usePagedList<T>>
