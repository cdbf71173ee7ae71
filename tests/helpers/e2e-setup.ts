import { afterEach } from 'vitest'
import { reportOpenPages } from './browser-journal'
import { SHOTS_DIR } from './browser'

// A failed browser test says where each of its pages stood and what they were answered.
afterEach(async (ctx) => {
  if (ctx.task.result?.state === 'fail') await reportOpenPages(ctx.task.name, SHOTS_DIR)
})
