import { afterAll, beforeAll, expect, it } from 'vitest'
import type { Browser, Page } from 'puppeteer-core'
import { PASSWORD, makeUser } from '../helpers/factories'
import { enter, launchBrowser, newPage, shot, signInAs } from '../helpers/browser'
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

async function move(page: Page, to: string) {
  await page.locator(`button ::-p-text(Move to ${to})`).click()
  await page.waitForSelector(`::-p-text(→ ${to})`)
}

it('takes a paid order through build and tuning to shipping, and the customer sees it shipped', async () => {
  const { quote, customer } = await rig.acceptedQuote()
  const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
  await rig.payOnPage(body.url)
  const builder = await makeUser(rig.t, 'production')
  const page = await newPage({ browser })
  await signInAs(page, rig.appUrl, builder.email, PASSWORD)
  await page.goto(`${rig.appUrl}/work-orders`)
  await page.waitForSelector('a[href^="/work-orders/"]')
  await shot(page, 'production-1-queue')
  const links = await page.$$eval('a[href^="/work-orders/"]', (as) =>
    as.map((a) => a.getAttribute('href')),
  )
  const wo = (await rig.t.services.production.list()).find((w) => w.quoteId === quote.id)!
  expect(links).toContain(`/work-orders/${wo.id}`)
  await page.goto(`${rig.appUrl}/work-orders/${wo.id}`)
  // a double tap on a move makes one step and no error
  const first = await page.waitForSelector('button ::-p-text(Move to in-build)')
  await first!.click({ count: 2 })
  await page.waitForSelector('::-p-text(→ in-build)')
  await move(page, 'tuning')
  const moves = (await rig.t.services.production.get(wo.id)).events
  expect(moves.filter((e) => e.toState === 'in-build')).toHaveLength(1)
  expect(await page.$$('.p-toast-message-error')).toHaveLength(0)
  // the measured frequency typed as on the workshop floor: a decimal comma and its unit
  const target = wo.specification.targetFrequencyHz
  const typed = Number(target.toFixed(2))
  await enter(page, '#measured-hz', `${String(typed).replace('.', ',')} Hz`)
  await page.waitForSelector(`::-p-text(= ${typed} Hz)`)
  await page.locator('button ::-p-text(Record measurement)').click()
  await page.waitForSelector('::-p-text(within tolerance)')
  const tuned = await rig.t.services.production.get(wo.id)
  expect(tuned.latestTuning?.measuredHz).toBe(typed)
  await shot(page, 'production-2-tuned')
  await move(page, 'ready')
  await move(page, 'shipped')
  await shot(page, 'production-3-shipped')
  await page.browserContext().close()

  const portal = await newPage({ browser })
  await signInAs(portal, rig.appUrl, customer.user.email, PASSWORD)
  await portal.goto(`${rig.appUrl}/portal/quotes/${quote.id}`)
  await portal.waitForSelector('::-p-text(production: shipped)')
  await shot(portal, 'production-4-customer-sees-shipped')
  const mailbox = (await (await fetch(`${rig.t.mail.httpUrl}/api/messages`)).json()) as {
    subject: string
    to: string[]
  }[]
  expect(
    mailbox.some((m) => /shipped/.test(m.subject) && m.to.join().includes(customer.user.email)),
  ).toBe(true)
  await portal.browserContext().close()
})
