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

/**
 * Moves one step by the button's words; the button is off for a moment after each answer, so
 * wait until it is on. The history says the new state in words.
 */
async function move(page: Page, button: string, toWords: string) {
  await page.locator(`button:not([disabled]) ::-p-text(${button})`).click()
  await page.waitForSelector(`::-p-text(→ ${toWords})`)
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
  // the queue searches on the server: wait for the page of one row
  // found by its quote's number, its state said in words
  await enter(page, '#wo-search', quote.number)
  await page.waitForFunction(
    (href) =>
      [...document.querySelectorAll('a[href^="/work-orders/"]')]
        .map((a) => a.getAttribute('href'))
        .join() === href,
    {},
    `/work-orders/${wo.id}`,
  )
  await page.waitForSelector('::-p-text(Waiting to start)')
  await shot(page, 'production-1-queue-found')
  await enter(page, '#wo-search', 'no such order anywhere')
  await page.waitForSelector('::-p-text(No work order matches.)')
  await page.goto(`${rig.appUrl}/work-orders/${wo.id}`)
  // A double tap moves one step: the second tap must not take the next step's button.
  await page.locator('button:not([disabled]) ::-p-text(Start the build)').click({ count: 2 })
  await page.waitForSelector('::-p-text(→ Being built)')
  await page.waitForSelector('button:not([disabled]) ::-p-text(Start tuning)')
  expect(await page.$$('.p-toast-message-error')).toHaveLength(0)
  const once = (await rig.t.services.production.get(wo.id)).events
  expect(once.map((e) => e.toState)).toEqual(['in-build'])
  await move(page, 'Start tuning', 'Being tuned')
  // the measured frequency typed as on the workshop floor: a decimal comma and its unit
  const target = wo.specification.targetFrequencyHz
  const typed = Number(target.toFixed(2))
  await enter(page, '#measured-hz', `${String(typed).replace('.', ',')} Hz`)
  await page.waitForSelector(`::-p-text(= ${typed} Hz)`)
  await page.locator('button:not([disabled]) ::-p-text(Record measurement)').click()
  await page.waitForSelector('::-p-text(within tolerance)')
  const tuned = await rig.t.services.production.get(wo.id)
  expect(tuned.latestTuning?.measuredHz).toBe(typed)
  await shot(page, 'production-2-tuned')
  await move(page, 'Mark ready to ship', 'Ready to ship')
  await page.locator('#ship-carrier').fill('Northway Freight')
  await page.locator('#ship-tracking').fill('NWF-2231')
  await page.locator('#ship-serial-0').fill('TDW-0001')
  await page.locator('button ::-p-text(Record shipment and mark shipped)').click()
  await page.waitForSelector('::-p-text(→ Shipped)')
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
