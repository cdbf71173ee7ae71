import { loadFakesConfig } from './env'
import { startMailCatcher } from './mail'
import { startPaymentsFake } from './payments'

// Loopback only: the fakes accept any mail and take no real keys, so nothing outside may reach them.
const HOST = '127.0.0.1'

async function main(): Promise<void> {
  const config = loadFakesConfig()
  const payments = await startPaymentsFake({
    port: config.PAYMENTS_FAKE_PORT,
    host: HOST,
    secretKey: config.PAYMENTS_SECRET_KEY,
    webhookSecret: config.PAYMENTS_WEBHOOK_SECRET,
    webhookUrl: config.PAYMENTS_WEBHOOK_URL,
    publicUrl: config.PAYMENTS_PUBLIC_URL,
  })
  const mail = await startMailCatcher({
    smtpPort: config.MAIL_SMTP_PORT,
    httpPort: config.MAIL_WEB_PORT,
    host: HOST,
  }).catch(async (err: unknown) => {
    await payments.close()
    throw err
  })
  console.log(`payments fake: ${payments.url} (webhooks to ${config.PAYMENTS_WEBHOOK_URL})`)
  console.log(`mail catcher: smtp://${HOST}:${mail.smtpPort}, mailbox ${mail.httpUrl}`)

  let stopping = false
  const stop = (signal: NodeJS.Signals): void => {
    if (stopping) return
    stopping = true
    console.log(`fakes: ${signal} received, stopping`)
    Promise.all([payments.close(), mail.close()]).then(
      () => process.exit(0),
      (err: unknown) => {
        console.error('fakes: error while stopping', err)
        process.exit(1)
      },
    )
  }
  process.on('SIGTERM', stop)
  process.on('SIGINT', stop)
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err)
  process.exit(1)
})
