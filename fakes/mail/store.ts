import type { CaughtMessage } from './types'

/** Messages in memory, in order of arrival. */
export interface MailStore {
  add: (message: CaughtMessage) => void
  get: (id: string) => CaughtMessage | undefined
  /** Oldest first, the order they arrived in. */
  all: () => CaughtMessage[]
  newestFirst: () => CaughtMessage[]
  count: () => number
  clear: () => void
}

export function createMailStore(): MailStore {
  const messages: CaughtMessage[] = []
  return {
    add: (message) => void messages.push(message),
    get: (id) => messages.find((m) => m.id === id),
    all: () => [...messages],
    newestFirst: () => [...messages].reverse(),
    count: () => messages.length,
    clear: () => void (messages.length = 0),
  }
}
