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

/** Moves one step; the button is off for a moment after each answer, so wait until it is on. */
async function move(page: Page, to: string) {
  await page.locator(`button:not([disabled]) ::-p-text(Move to ${to})`).click()
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
  await page.locator('button:not([disabled]) ::-p-text(Move to in-build)').click({ count: 2 })
  await page.waitForSelector('::-p-text(→ in-build)')
  await page.waitForSelector('button:not([disabled]) ::-p-text(Move to tuning)')
  expect(await page.$$('.p-toast-message-error')).toHaveLength(0)
  const once = (await rig.t.services.production.get(wo.id)).events
  expect(once.map((e) => e.toState)).toEqual(['in-build'])
  await move(page, 'tuning')
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
  await move(page, 'ready')
  await move(page, 'shipped')
  await shot(page, 'production-3-shipped')
  await page.browserContext().close()

  const portal = await newPage({ browser })
  await signInAs(portal, rig.appUrl, customer.user.email, PASSWORD)
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
