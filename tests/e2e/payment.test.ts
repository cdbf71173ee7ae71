import { afterAll, beforeAll, expect, it } from 'vitest'
import type { Browser } from 'puppeteer-core'
import { TEST_CARDS } from '../../fakes/payments'
import { PASSWORD, makeUser } from '../helpers/factories'
import { launchBrowser, newPage, shot, signInAs } from '../helpers/browser'
import { makePaymentRig, type PaymentRig } from '../api/payments-rig'

let rig: PaymentRig
let browser: Browser
beforeAll(async () => {
  rig = await makePaymentRig({ CLIENT_DIR: 'dist/client' })
  browser = await launchBrowser()
})
afterAll(async () => {
  await browser?.close()
  await rig?.close()
})

it('lets a customer accept a quote, pay on the payment page and see the order confirmed', async () => {
  const { quote, company } = await rig.sentQuote()
  const customer = await makeUser(rig.t, 'customer', { companyId: company.id })
  const page = await newPage({ browser })
  await signInAs(page, rig.appUrl, customer.email, PASSWORD)
  await page.goto(`${rig.appUrl}/portal/quotes/${quote.id}`)
  await page.locator('#accept-name').fill('Dana Whitlock')
  await page.locator('#accept-po').fill('PO-88120')
  await shot(page, 'payment-1-accept')
  await page.locator('button[type="submit"]').click()
  await page.locator('button ::-p-text(Pay)').click()
  await page.waitForSelector('#card')
  await shot(page, 'payment-2-pay-page')
  await page.locator('#card').fill(TEST_CARDS.succeeds)
  await Promise.all([page.waitForNavigation(), page.locator('button[value="pay"]').click()])
  await page.waitForSelector('::-p-text(Payment received)')
  expect(page.url()).toContain('/portal/payment/done')
  await shot(page, 'payment-3-confirmed')
  const mailbox = (await (await fetch(`${rig.t.mail.httpUrl}/api/messages`)).json()) as {
    subject: string
    to: string[]
  }[]
  expect(
    mailbox.some(
      (m) => m.subject.startsWith('Payment received') && m.to.join().includes(customer.email),
    ),
  ).toBe(true)
  await page.browserContext().close()
})
