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
  /** The status the receiver answers with; set it to 500 to play a receiver that is down. */
  status: number
  close: () => Promise<void>
}

/**
 * A stand-in for the app's webhook route: raw body kept byte for byte, since the signature
 * is computed over the exact bytes sent.
 */
export async function startWebhookReceiver(): Promise<WebhookReceiver> {
  const app = express()
  const server = createServer(app)
  const port = await listen(server, 0, '127.0.0.1')
  const receiver: WebhookReceiver = {
    url: `http://127.0.0.1:${port}/hook`,
    received: [],
    status: 200,
    close: () => closeServer(server),
  }
  app.post('/hook', express.raw({ type: 'application/json' }), (req, res) => {
    receiver.received.push({
      rawBody: req.body as Buffer,
      signature: req.get('stripe-signature') ?? '',
    })
    res.status(receiver.status).json({ received: receiver.status < 300 })
  })
  return receiver
}
