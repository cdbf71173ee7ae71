import { createServer } from 'node:http'
import type { AddressInfo } from 'node:net'
import { closeServer, listen } from '../shared/listen'
import { createSmtpCatcher } from './smtp'
import { createMailStore } from './store'
import type { CaughtMessage } from './types'
import { createMailWeb } from './web'

export interface MailCatcherOptions {
  /** 0 picks a free port. */
  smtpPort: number
  /** 0 picks a free port. */
  httpPort: number
  host: '127.0.0.1'
}

export interface RunningMailCatcher {
  /** The SMTP port actually bound. */
  smtpPort: number
  /** Base URL of the mailbox page and JSON API, e.g. http://127.0.0.1:4380. */
  httpUrl: string
  /** Caught messages, oldest first. */
  messages: () => CaughtMessage[]
  clear: () => void
  close: () => Promise<void>
}

/**
 * Starts the SMTP catcher and its mailbox web page on loopback.
 * @param options ports (0 for any free one) and the loopback host
 */
export async function startMailCatcher(options: MailCatcherOptions): Promise<RunningMailCatcher> {
  const store = createMailStore()
  const smtp = createSmtpCatcher(store.add)
  await new Promise<void>((resolve, reject) => {
    smtp.once('error', reject)
    smtp.listen(options.smtpPort, options.host, () => {
      smtp.off('error', reject)
      resolve()
    })
  })
  // After start-up, a broken client connection must not bring the process down.
  smtp.on('error', (err) => console.error('[mail-catcher]', err.message))
  const smtpPort = (smtp.server.address() as AddressInfo).port
  const web = createServer(createMailWeb(store))
  let httpPort: number
  try {
    httpPort = await listen(web, options.httpPort, options.host)
  } catch (err) {
    await new Promise<void>((resolve) => smtp.close(() => resolve()))
    throw err
  }
  return {
    smtpPort,
    httpUrl: `http://${options.host}:${httpPort}`,
    messages: store.all,
    clear: store.clear,
    close: async () => {
      await Promise.all([
        new Promise<void>((resolve) => smtp.close(() => resolve())),
        closeServer(web),
      ])
    },
  }
}
