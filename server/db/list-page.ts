/** One page of a list and the total matching its filters. */
export interface Page<T> {
  total: number
  items: T[]
}

/** `%text%` for LIKE, with LIKE's own wildcards and its escape character taken literally. */
export const likeText = (text: string) => `%${text.replace(/[%_\\]/g, '\\$&')}%`
