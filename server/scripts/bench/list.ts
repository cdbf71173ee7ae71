/** The list figure: p95 of GET /api/quotes with 1 000 quotes stored, at 50 connections. */
import { client, concurrentP95 } from './http-load'
import { signIn } from './requests'

export const CONNECTIONS = 50
const LIST_SECONDS = 20
/** s a request may still run after the load stops before it is cut off */
const LIST_GRACE = 40

export async function benchList(base: string, progress: (s: string) => void) {
  const sales = await signIn(base, 'sales@quellnode.test', 'demo-sales-1')
  progress(`quotes list at ${CONNECTIONS} connections for ${LIST_SECONDS} s`)
  const list = client(base, sales, CONNECTIONS)
  try {
    // the quotes in the database (the list answers one page; the total rides in its header)
    const first = await fetch(`${base}/api/quotes`, { headers: { cookie: sales } })
    const rows = Number(first.headers.get('x-total-count'))
    const load = await concurrentP95(list, '/api/quotes', CONNECTIONS, LIST_SECONDS, LIST_GRACE)
    progress(`quotes list p95 ${load.p95.toFixed(0)} ms over ${load.count} requests`)
    if (load.errors) progress(`quotes list: connections failed: ${load.errors.note}`)
    const note = listNote(load)
    return { rows, connections: CONNECTIONS, p95Ms: load.p95, ...(note && { note }) }
  } finally {
    list.close()
  }
}

/** What qualifies the list's p95: requests cut off at the end, connections that failed. */
function listNote(load: {
  stopped: number
  errors: { count: number; note: string } | null
}): string | undefined {
  const notes = [
    load.stopped > 0 &&
      `${load.stopped} requests still open ${LIST_SECONDS + LIST_GRACE} s after the start were cut off there: the p95 is a lower bound`,
    load.errors &&
      `${load.errors.count} requests failed on their connection (${load.errors.note}) and are not in the p95`,
  ].filter(Boolean)
  return notes.length ? notes.join('; ') : undefined
}
