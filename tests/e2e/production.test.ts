import { afterAll, beforeAll, expect, it } from 'vitest'
import type { Browser, Page } from 'puppeteer-core'
import { makeUser } from '../helpers/factories'
import { enter, launchBrowser, mainText, pageSignedInAs, shot } from '../helpers/browser'
import { move, searchQueueFor, ship } from '../helpers/work-order-page'
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
/** The browser and the address of the built client, to open signed-in pages on. */
const app = () => ({ browser, url: rig.appUrl })

it('takes a paid order through build and tuning to shipping, and the customer sees it shipped', async () => {
  const { quote, customer } = await rig.acceptedQuote()
  const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
  await rig.payOnPage(body.url)
  const builder = await makeUser(rig.t, 'production')
  const page = await pageSignedInAs(app(), builder)
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
  await searchQueueFor(page, quote.number, wo.id)
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
  await ship(page, { carrier: 'Northway Freight', tracking: 'NWF-2231', serials: ['TDW-0001'] })
  await shot(page, 'production-3-shipped')
  await page.browserContext().close()

  const portal = await pageSignedInAs(app(), customer.user)
  await portal.goto(`${rig.appUrl}/portal/quotes/${quote.id}`)
  await portal.waitForSelector('li[data-step="shipped"][aria-current="step"].reached')
  await portal.waitForSelector('::-p-text(Your unit has shipped.)')
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

/** The hrefs of the work-order links the queue shows now. */
const shownLinks = (page: Page) =>
  page.$$eval('a[href^="/work-orders/"]', (as) => as.map((a) => a.getAttribute('href')).join())

/** Records one reading through the form, typed as on the workshop floor. */
async function record(page: Page, hz: number) {
  await enter(page, '#measured-hz', `${hz} Hz`)
  await page.locator('button:not([disabled]) ::-p-text(Record measurement)').click()
  await page.waitForSelector(`::-p-text(${hz} Hz)`)
}

it('production search and shipping details visible to the customer', async () => {
  // two paid orders, so the search has something to leave out
  const other = await rig.acceptedQuote()
  await rig.payOnPage(
    (await other.customer.agent.post(`/api/quotes/${other.quote.id}/checkout`)).body.url,
  )
  const { quote, customer } = await rig.acceptedQuote()
  await rig.payOnPage((await customer.agent.post(`/api/quotes/${quote.id}/checkout`)).body.url)
  const wo = (await rig.t.services.production.list()).find((w) => w.quoteId === quote.id)!
  const builder = await makeUser(rig.t, 'production')

  const page = await pageSignedInAs(app(), builder)
  await page.goto(`${rig.appUrl}/work-orders`)
  await page.waitForSelector(`::-p-text(${wo.orderNumber})`)
  // found by the quote's number alone; the row shows order and quote numbers and the due date
  await searchQueueFor(page, quote.number, wo.id)
  const row = await page.$eval('tbody tr', (tr) => tr.textContent ?? '')
  expect(row).toContain(wo.orderNumber)
  expect(row).toContain(quote.number)
  expect(row).toContain(wo.dueDate)
  expect(row).toContain('Waiting to start')
  expect(await shownLinks(page)).toBe(`/work-orders/${wo.id}`)
  await shot(page, 'production-search-1-found-by-quote')

  await page.locator(`a[href="/work-orders/${wo.id}"]`).click()
  await page.waitForSelector('::-p-text(End-stop clearance)')
  const sheet = await mainText(page)
  expect(sheet).toContain('Static deflection')
  expect(sheet).toContain('Vertical: the mass moves up and down')
  expect(sheet).toContain('Delivery contact')
  expect(sheet).not.toMatch(/\bqueued\b|\bin-build\b/)
  await move(page, 'Start the build', 'Being built')
  await move(page, 'Start tuning', 'Being tuned')
  // 6.75 Hz target: 6.95 is +2.96 % (out of the ±2 %), 6.77 is +0.30 % (within)
  const target = wo.specification.targetFrequencyHz
  expect(target).toBeCloseTo(6.75, 9)
  await record(page, 6.95)
  await page.waitForSelector('::-p-text(+2.96 %)')
  await record(page, 6.77)
  await page.waitForSelector('::-p-text(+0.30 %)')
  await shot(page, 'production-search-2-tuning-record')
  await move(page, 'Mark ready to ship', 'Ready to ship')

  // shipping without a carrier is refused beside the field, naming it
  await page.locator('#ship-tracking').fill('NWF-5520-1187')
  await page.locator('#ship-serial-0').fill('TDW-FLRS-26-0533')
  await page.locator('button ::-p-text(Record shipment and mark shipped)').click()
  await page.waitForSelector('::-p-text(required: the carrier)')
  await shot(page, 'production-search-3-carrier-missing')
  expect((await rig.t.services.production.get(wo.id)).state).toBe('ready')
  await page.locator('#ship-carrier').fill('Northway Freight')
  await page.locator('button:not([disabled]) ::-p-text(Record shipment and mark shipped)').click()
  await page.waitForSelector('::-p-text(→ Shipped)')
  await page.waitForSelector('::-p-text(tracking number NWF-5520-1187)')
  await shot(page, 'production-search-4-shipped')
  await page.browserContext().close()

  const portal = await pageSignedInAs(app(), customer.user)
  await portal.goto(`${rig.appUrl}/portal/quotes/${quote.id}`)
  await portal.waitForSelector('::-p-text(Tracking number)')
  const seen = await portal.$eval('.order-shipment', (s) => s.textContent ?? '')
  expect(seen).toContain('Northway Freight')
  expect(seen).toContain('NWF-5520-1187')
  expect(seen).toContain('TDW-FLRS-26-0533')
  await shot(portal, 'production-search-5-customer-sees-shipment')
  // on a phone the shipment fits the screen
  await portal.setViewport({ width: 390, height: 844, hasTouch: true })
  const right = await portal.$eval('.order-shipment', (s) => s.getBoundingClientRect().right)
  await shot(portal, 'production-search-6-customer-phone')
  expect(right).toBeLessThanOrEqual(390)
  await portal.browserContext().close()
})
