import { afterEach } from 'vitest'
import { reportOpenPages } from './browser-journal'
import { SHOTS_DIR } from './browser'

// A failed browser test says what failed, at which line of the test, and where each of its pages
// stood and what they were answered (printed even when its second run passes).
afterEach(async (ctx) => {
  const result = ctx.task.result
  if (result?.state !== 'fail') return
  const error = result.errors?.[0]
  const at = (error?.stack ?? '')
    .split('\n')
    .filter((l) => /tests\/(e2e|helpers)\//.test(l))
    .map((l) => l.trim())
  const why = [`${error?.name ?? 'Error'}: ${error?.message ?? '?'}`, ...at].join(' ← ')
  await reportOpenPages(ctx.task.name, SHOTS_DIR, why)
})
