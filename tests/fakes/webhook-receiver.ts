import express from 'express'
import { createServer } from 'node:http'
import { closeServer, listen } from '../../fakes/shared/listen'

export interface ReceivedHook {
  rawBody: Buffer
  signature: string
}

export interface WebhookReceiver {
  url: string
  received: ReceivedHook[]
  close: () => Promise<void>
}

/**
 * A stand-in for the app's webhook route: raw body kept byte for byte, since the signature
 * is computed over the exact bytes sent.
 */
export async function startWebhookReceiver(): Promise<WebhookReceiver> {
  const received: ReceivedHook[] = []
  const app = express()
  app.post('/hook', express.raw({ type: 'application/json' }), (req, res) => {
    received.push({ rawBody: req.body as Buffer, signature: req.get('stripe-signature') ?? '' })
    res.json({ received: true })
  })
  const server = createServer(app)
  const port = await listen(server, 0, '127.0.0.1')
  return { url: `http://127.0.0.1:${port}/hook`, received, close: () => closeServer(server) }
}
