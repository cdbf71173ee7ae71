import { afterAll, beforeAll } from 'vitest'
import type { Browser } from 'puppeteer-core'
import { launchBrowser } from '../helpers/browser'
import { makePaymentRig, type PaymentRig } from '../api/payments-rig'

/**
 * The payment rig serving the built client, and one Chromium, started before a file's tests and
 * closed after them; the object is filled in by beforeAll.
 */
export function paymentBrowserRigPerFile(): PaymentRig & { browser: Browser } {
  const rig = {} as PaymentRig & { browser: Browser }
  beforeAll(async () => {
    Object.assign(rig, await makePaymentRig({ CLIENT_DIR: 'dist/client' }))
    rig.browser = await launchBrowser()
  })
  afterAll(async () => {
    await rig.browser?.close()
    await rig.close?.()
  })
  return rig
}
