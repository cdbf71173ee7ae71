import type { Response } from 'express'
import type { Page } from '../db/list-page'

/**
 * Answers a page of a list: its rows as the body, the total matching the filters in the
 * X-Total-Count header (what `api.page` in src/api/client.ts reads).
 * @param res the route's response
 * @param page the rows and the total
 */
export function answerPage<T>(res: Response, page: Page<T>): T[] {
  res.set('x-total-count', String(page.total))
  return page.items
}
