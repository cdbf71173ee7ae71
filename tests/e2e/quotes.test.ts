import { randomBytes } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { toAuthUser } from '../../server/modules/auth/auth.service'
import { closePdfRenderers } from '../../server/integrations/pdf/renderer'
import { DEMO_OFFICE_SIZING } from '../../seed/seed-sizings'
import { DEMO_USERS } from '../../seed/demo-people'
import type { Page } from 'puppeteer-core'
import { formatMoney } from '../../shared/money'
import type { QuoteLineInput } from '../../shared/schemas/quote'
import {
  enter,
  LANDSCAPE,
  PORTRAIT,
  navigate,
  newPage,
  shot,
  signInAs,
  startBrowserRig,
  tapButton,
  type BrowserRig,
} from '../helpers/browser'
import { seedDemoSizings } from '../helpers/demo-seed'

let rig: BrowserRig
let sizingId: number
let salesUser: ReturnType<typeof toAuthUser>
/** This file's own handed-over sizing: other browser files of the run may quote the demo one. */
const TITLE = `${DEMO_OFFICE_SIZING}, desk run ${randomBytes(3).toString('hex')}`
beforeAll(async () => {
  rig = await startBrowserRig()
  const s = rig.t.services
  await seedDemoSizings(s)
  const admin = toAuthUser((await s.users.findByEmail('admin@quellnode.test'))!)
  const engineer = toAuthUser((await s.users.findByEmail('engineer@quellnode.test'))!)
  const [demo] = await s.sizings.list(admin, { search: DEMO_OFFICE_SIZING })
  const { input } = await s.sizings.view(admin, demo!.id)
  const own = await s.sizings.create(engineer, { ...input, title: TITLE })
  await s.sizings.submit(engineer, own.id, { revision: own.currentRevision, note: '' })
  sizingId = own.id
  salesUser = toAuthUser((await s.users.findByEmail('sales@quellnode.test'))!)
})
afterAll(async () => {
  await closePdfRenderers()
  await rig?.close()
})

const sales = DEMO_USERS.find((u) => u.role === 'sales')!

/** Waits until the element's text (anywhere on the page, dialogs included) contains `needle`. */
async function textIn(page: Page, selector: string, needle: string) {
  await page.waitForFunction(
    (sel, n) => document.querySelector(sel)?.textContent?.includes(n),
    {},
    selector,
    needle,
  )
}

/** The server's own price of the lines, to compare what the screen shows against. */
const serverPrice = (lines: QuoteLineInput[], discountBp = 0) =>
  rig.t.services.quotes.pricePreview(salesUser, {
    sizingId,
    currency: 'EUR',
    discountBp,
    taxRateId: null,
    lines,
  })

describe('sales quote the demo sizing in Chromium on a tablet', () => {
  it('sales from the ready list: one tap starts the quote, prices follow the lines, a bad discount is refused, the mail is previewed and sent', async () => {
    const page = await newPage(rig)
    await signInAs(page, rig.url, sales.email, sales.password)
    await navigate(page, 'Quotes')
    await page.waitForSelector('#ready-title')
    await page.locator('input[aria-label="Search sizings ready to quote"]').fill(TITLE)
    const start = `::-p-aria([name="Start a quote for ${TITLE}"][role="button"])`
    await page.waitForSelector(start)
    await shot(page, 'quotes-1-ready-list')
    await page.locator(start).click()
    // one tap: the builder opens with the sizing chosen, no number to type
    await page.waitForSelector('section[aria-label="Units that can carry the sizing"] button')
    expect(page.url()).toContain(`/quotes/new?sizing=${sizingId}`)
    expect(await page.$('#sizing-no')).toBeNull()
    await page.waitForSelector(`::-p-text(${TITLE})`)
    // The first unit offered is one the matcher found able to carry the sizing.
    const add = await page.waitForSelector(
      'section[aria-label="Units that can carry the sizing"] button',
    )
    const unitLabel = await add!.evaluate((b) => b.textContent?.trim() ?? '')
    expect(unitLabel).toMatch(/^Add [A-Z0-9-]+$/)
    await add!.click()
    const unitCode = unitLabel.slice(4)
    const unitId = (await rig.t.services.catalogue.listLines('sales', true)).find(
      (l) => l.code === unitCode,
    )!.id
    const one = await serverPrice([{ kind: 'unit', productLineId: unitId, quantity: 1 }])
    const each = formatMoney(one.lines[0]!.unitPrice, 'EUR')
    await textIn(page, '[data-test="line-price-0"]', `${each} each`)
    // two units: the line and the total follow without a save
    await enter(page, '#line-qty-0', '2')
    const two = await serverPrice([{ kind: 'unit', productLineId: unitId, quantity: 2 }])
    await textIn(page, '[data-test="line-price-0"]', formatMoney(two.lines[0]!.lineTotal, 'EUR'))
    await textIn(page, '[data-test="quote-total"]', formatMoney(two.total, 'EUR'))
    await page.locator('#add-option').click()
    await page.locator('li[role="option"] ::-p-text(Site tuning visit)').click()
    await tapButton(page, 'Add option')
    await textIn(page, '[data-test="line-price-1"]', 'each')
    // a quantity of 0 is an error beside the field, never turned into 1
    await enter(page, '#line-qty-0', '0')
    await textIn(page, 'section[aria-label="Quote lines"]', 'at least 1')
    expect(await page.$eval('#line-qty-0', (e) => (e as HTMLInputElement).value)).toBe('0')
    await enter(page, '#line-qty-0', '2')
    // a discount of 150 % is refused with a message naming the field, and nothing is saved
    await enter(page, '#q-discount', '150')
    await page.waitForSelector('::-p-text(Discount: at most 100 %)')
    await shot(page, 'quotes-2-discount-refused')
    await tapButton(page, 'Save draft')
    await page.waitForSelector('::-p-text(Discount: at most 100 %)')
    const quoted = async () =>
      (await rig.t.services.quotes.list(salesUser, {})).items.filter((q) => q.sizingId === sizingId)
    expect(await quoted()).toHaveLength(0)
    // a bare number in a percentage field is a percentage: "0,05" is 0.05 %, 5 basis points
    await enter(page, '#q-discount', '0,05')
    await page.waitForSelector('::-p-text(= 0.05 %)')
    await page.waitForFunction(() => !document.body.textContent?.includes('Discount: at most'))
    await shot(page, 'quotes-3-builder')
    // a double tap on save makes one quote and no error
    // other browser tests in this run may have quoted the same demo sizing: count only new ones
    const quotesOfSizing = async () =>
      (await rig.t.services.quotes.list(salesUser, { limit: 200 })).items.filter(
        (q) => q.sizingId === sizingId,
      )
    const before = new Set((await quotesOfSizing()).map((q) => q.id))
    const save = await page.waitForSelector('::-p-xpath(//button[normalize-space(.)="Save draft"])')
    await save!.click({ count: 2 })
    // the saved draft opens; a refusal would show as an alert instead: say which
    await page.waitForSelector('[data-state="draft"], [role="alert"]')
    const refusal = await page.$eval('body', (b) =>
      b.querySelector('[data-state="draft"]')
        ? null
        : b.querySelector('[role="alert"]')?.textContent,
    )
    expect(refusal ?? null).toBeNull()
    const drafts = (await quotesOfSizing()).filter((q) => !before.has(q.id))
    expect(drafts).toHaveLength(1)
    expect((await rig.t.services.quotes.get(salesUser, drafts[0]!.id)).discountBp).toBe(5)
    const heading = await page.$eval('h1', (h) => h.textContent ?? '')
    const number = /TDW-\d{4}-\d{4}/.exec(heading)?.[0]
    expect(number).toBeDefined()
    expect(await page.$$eval('[aria-label="Quote lines"] tbody tr', (r) => r.length)).toBe(2)

    // the send dialog shows the mail as the customer will get it, with the personal message
    await tapButton(page, 'Send to customer')
    await textIn(page, '[data-test="mail-subject"]', `Quotation ${number}`)
    await textIn(page, '[data-test="mail-attachment"]', `${number}.pdf`)
    await textIn(page, '[data-test="mail-to"]', 'customer@marlowquay.test')
    const note = 'Good to meet you on site; the unit fits under the raised floor.'
    await page.locator('#send-message').fill(note)
    await textIn(page, '[data-test="mail-text"]', note)
    await shot(page, 'quotes-4-send-preview')
    const send = await page.waitForSelector(
      '::-p-xpath(//div[@role="dialog"]//button[normalize-space(.)="Send" and not(@disabled)])',
    )
    await send!.click({ count: 2 })
    await page.waitForSelector('[data-state="sent"]')
    expect(await page.$$('.p-toast-message-error')).toHaveLength(0)
    const sent = await rig.t.services.quotes.internal(drafts[0]!.id)
    expect(sent.events.filter((e) => e.toState === 'sent')).toHaveLength(1)
    await shot(page, 'quotes-5-sent')

    const box = await newPage(rig, LANDSCAPE)
    await box.goto(rig.t.mail.httpUrl)
    await box.waitForSelector(`::-p-text(Quotation ${number})`)
    const caught = rig.t.mail.messages().find((m) => m.subject.includes(number!))
    expect(caught?.to.join(',')).toContain('customer@marlowquay.test')
    expect(caught?.attachments[0]?.contentType).toBe('application/pdf')
    expect(caught?.attachments[0]?.filename).toBe(`${number}.pdf`)
    expect(caught?.text).toContain(note)
    expect(caught?.text).toContain(`${rig.url}/portal/quotes/`)
    await shot(box, 'quotes-6-mailbox')
    await page.browserContext().close()
    await box.browserContext().close()
  })

  it('fits the ready list and the quote builder on both tablet orientations and a phone', async () => {
    for (const [name, viewport] of [
      ['portrait', PORTRAIT],
      ['landscape', LANDSCAPE],
      ['phone', { width: 390, height: 844 }],
    ] as const) {
      const page = await newPage(rig, viewport)
      await signInAs(page, rig.url, sales.email, sales.password)
      for (const [where, path] of [
        ['list', '/quotes'],
        ['builder', `/quotes/new?sizing=${sizingId}`],
      ] as const) {
        await page.goto(`${rig.url}${path}`)
        await page.waitForSelector(
          where === 'list'
            ? '#ready-title'
            : 'section[aria-label="Units that can carry the sizing"] button',
        )
        await shot(page, `quotes-fit-${where}-${name}`)
        const { scroll, inner } = await page.evaluate(() => ({
          scroll: document.documentElement.scrollWidth,
          inner: window.innerWidth,
        }))
        expect(scroll, `${where} at ${name}`).toBeLessThanOrEqual(inner)
      }
      await page.browserContext().close()
    }
  })

  it('reads a price per kg typed with a decimal comma as the amount, never ten times it', async () => {
    const admin = DEMO_USERS.find((u) => u.role === 'admin')!
    const page = await newPage(rig)
    await signInAs(page, rig.url, admin.email, admin.password)
    await page.goto(`${rig.url}/admin/catalogue`)
    const edit = await page.waitForSelector('button[aria-label^="Edit "]')
    const code = (await edit!.evaluate((b) => b.getAttribute('aria-label') ?? '')).slice(5)
    await edit!.click()
    // the dialog puts the focus in itself once it has opened; type after that
    await page.waitForFunction(() => document.activeElement?.closest('[role="dialog"]'))
    await enter(page, '#pl-eur-perKg', '12,5')
    await page.waitForSelector('::-p-text(= €12.50)')
    await shot(page, 'quotes-4-catalogue-price')
    await tapButton(page, 'Save')
    await page.waitForSelector('::-p-text(€12.50/kg)')
    const line = (await rig.t.services.catalogue.listLines('admin', true)).find(
      (l) => l.code === code,
    )
    expect(line?.prices?.EUR.perKg).toBe(1250)
    await page.browserContext().close()
  })
})
