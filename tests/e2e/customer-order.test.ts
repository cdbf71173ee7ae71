import { expect, it } from 'vitest'
import type { Page } from 'puppeteer-core'
import { PASSWORD, makeUser, signedIn } from '../helpers/factories'
import { newPage, shot, signInAs } from '../helpers/browser'
import { pdfText } from '../helpers/pdf'
import { paymentBrowserRigPerFile } from './payment-browser-rig'

const rig = paymentBrowserRigPerFile()

const DAY = 86_400_000
/** A date as the timeline should print it: "3 Dec 2026" (the UTC day). */
const printed = (ms: number) =>
  new Date(ms).toLocaleDateString('en-GB', {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  })

/** The text of one step of the timeline. */
const stepText = (page: Page, step: string) =>
  page.$eval(`li[data-step="${step}"]`, (li) =>
    (li as HTMLElement).innerText.replace(/\s+/g, ' ').trim(),
  )

/** No sideways scrolling of the page itself. */
const overflows = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth)

it('customer timeline and receipt: the order shows its steps with dates, the receipt is a PDF with the total, an old revision points to the current one', async () => {
  const { quote, customer } = await rig.acceptedQuote()
  const { body } = await customer.agent.post(`/api/quotes/${quote.id}/checkout`)
  await rig.payOnPage(body.url)
  const wo = (await rig.t.services.production.list()).find((w) => w.quoteId === quote.id)!
  const { agent: builder } = await signedIn(rig.t, 'production')
  rig.t.clock.offsetMs = 3 * DAY
  try {
    await builder.post(`/api/work-orders/${wo.id}/state`).send({ to: 'in-build' }).expect(200)
  } finally {
    rig.t.clock.offsetMs = 0
  }
  const order = (await customer.agent.get(`/api/quotes/${quote.id}/order`)).body.order

  const page = await newPage(rig)
  await signInAs(page, rig.appUrl, customer.user.email, PASSWORD)
  await page.goto(`${rig.appUrl}/portal/quotes/${quote.id}`)
  await page.waitForSelector('li[data-step="paid"]')
  // plain words first, the engineering folded below
  await page.waitForSelector('::-p-text(What this unit does for your structure)')
  await page.waitForSelector('::-p-text(licensed structural engineer)')
  expect(await page.$eval('details.fold', (d) => (d as HTMLDetailsElement).open)).toBe(false)
  expect(await stepText(page, 'paid')).toBe(`Paid ${printed(Date.parse(order.paidAt))}`)
  expect(await stepText(page, 'in-build')).toBe(
    `In build ${printed(Date.parse(order.paidAt) + 3 * DAY)}`,
  )
  expect(await stepText(page, 'tuning')).toBe('Tuning not yet')
  // FLR-S has an 8-week lead time in the demo catalogue
  await page.waitForSelector(
    `::-p-text(Expected delivery by ${printed(Date.parse(order.paidAt) + 56 * DAY)} (8 weeks from payment))`,
  )
  await shot(page, 'customer-order-1-timeline')

  const href = await page.$eval('a.receipt', (a) => a.getAttribute('href'))
  const bytes = await page.evaluate(async (url) => {
    const res = await fetch(url!, { credentials: 'same-origin' })
    return {
      type: res.headers.get('content-type'),
      data: Array.from(new Uint8Array(await res.arrayBuffer())),
    }
  }, href)
  expect(bytes.type).toBe('application/pdf')
  const pdf = Buffer.from(bytes.data)
  expect(pdf.subarray(0, 5).toString()).toBe('%PDF-')
  const total = new Intl.NumberFormat('en-GB', { style: 'currency', currency: 'EUR' }).format(
    order.amount / 100,
  )
  expect(await pdfText(pdf)).toContain(`Total paid ${total}`)

  // on a phone the steps go down the page and nothing scrolls sideways
  await page.setViewport({ width: 390, height: 844, hasTouch: true, isMobile: false })
  await page.reload()
  await page.waitForSelector('li[data-step="paid"]')
  expect(await overflows(page)).toBe(false)
  await shot(page, 'customer-order-2-phone')
  await page.browserContext().close()

  // a mail's link to an old revision leads on to the current one
  const { quote: old, company } = await rig.sentQuote()
  const rev = await rig.sales.post(`/api/quotes/${old.id}/revise`).expect(201)
  await rig.sales.post(`/api/quotes/${rev.body.id}/send`).expect(200)
  const other = await makeUser(rig.t, 'customer', { companyId: company.id })
  const mail = await newPage(rig)
  await signInAs(mail, rig.appUrl, other.email, PASSWORD)
  await mail.goto(`${rig.appUrl}/portal/quotes/${old.id}`)
  await mail.waitForSelector(`::-p-text(Quote ${old.number} was replaced)`)
  expect(await mail.$('::-p-text(does not exist)')).toBeNull()
  await shot(mail, 'customer-order-3-old-revision')
  await mail.locator(`a ::-p-text(Open the current revision)`).click()
  await mail.waitForSelector(`::-p-text(Quote ${old.number} rev 2)`)
  expect(mail.url()).toBe(`${rig.appUrl}/portal/quotes/${rev.body.id}`)
  // a link that leads nowhere says so and offers the way back
  await mail.goto(`${rig.appUrl}/portal/quotes/abc?payment=cancelled`)
  await mail.waitForSelector('::-p-text(Quote not found)')
  await mail.locator('section[aria-label="Quote not shown"] a ::-p-text(My quotes)').wait()
  await mail.browserContext().close()
})
