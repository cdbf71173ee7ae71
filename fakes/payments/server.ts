import { createServer } from 'node:http'
import { closeServer, listen } from '../shared/listen'
import { fakeContext, paymentsFakeApp } from './app'
import { runDueRetries } from './webhooks'
import type { PaymentsFakeOptions } from './types'

export interface StartPaymentsFakeOptions extends Omit<PaymentsFakeOptions, 'publicUrl'> {
  /** 0 picks a free port. */
  port: number
  host: '127.0.0.1'
  /** Defaults to the address actually bound, which suits port 0. */
  publicUrl?: string
}

export interface RunningPaymentsFake {
  /** Base URL, e.g. http://127.0.0.1:4310; the SDK's `port` is `new URL(url).port`. */
  url: string
  port: number
  close: () => Promise<void>
}

/**
 * Starts the payments fake on loopback. The app is built after the port is known, so the
 * pay-page URLs in sessions point at the real port when 0 was asked for.
 */
export async function startPaymentsFake(
  options: StartPaymentsFakeOptions,
): Promise<RunningPaymentsFake> {
  const { port: wanted, host, publicUrl, ...rest } = options
  const server = createServer()
  const port = await listen(server, wanted, host)
  const url = `http://${host}:${port}`
  const ctx = fakeContext({ ...rest, publicUrl: publicUrl ?? url })
  server.on('request', paymentsFakeApp(ctx))
  const pollMs = options.retryPollMs ?? 1000
  const timer =
    pollMs > 0
      ? setInterval(() => void runDueRetries(ctx).catch(() => undefined), pollMs).unref()
      : undefined
  return {
    url,
    port,
    close: () => {
      clearInterval(timer)
      return closeServer(server)
    },
  }
}
