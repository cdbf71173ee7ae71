import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { toAuthUser } from '../../server/modules/auth/auth.service'
import { closePdfRenderers } from '../../server/integrations/pdf/renderer'
import { seedPeople } from '../../seed/seed-people'
import { DEMO_OFFICE_SIZING, seedSizings } from '../../seed/seed-sizings'
import { seedCatalogue } from '../../seed/seed-catalogue'
import { DEMO_USERS } from '../../seed/demo-people'
import {
  enter,
  LANDSCAPE,
  navigate,
  newPage,
  shot,
  signInAs,
  startBrowserRig,
  type BrowserRig,
} from '../helpers/browser'

let rig: BrowserRig
let sizingId: number
let salesUser: ReturnType<typeof toAuthUser>
beforeAll(async () => {
  rig = await startBrowserRig()
  const s = rig.t.services
  const { companyIds } = await seedPeople(s)
  await seedCatalogue(s)
  await seedSizings(s, { companyIds })
  const admin = toAuthUser((await s.users.findByEmail('admin@quellnode.test'))!)
  const [demo] = await s.sizings.list(admin, { search: DEMO_OFFICE_SIZING })
  sizingId = demo!.id
  salesUser = toAuthUser((await s.users.findByEmail('sales@quellnode.test'))!)
})
afterAll(async () => {
  await closePdfRenderers()
  await rig?.close()
})

const sales = DEMO_USERS.find((u) => u.role === 'sales')!

/** Clicks the first button whose visible text is exactly `label`. */
async function clickButton(page: Awaited<ReturnType<typeof newPage>>, label: string) {
  const button = await page.waitForSelector(`::-p-xpath(//button[normalize-space(.)="${label}"])`)
  await button!.click()
}

describe('sales quote the demo sizing in Chromium on a tablet', () => {
  it('builds a quote with one unit and one option, sends it, and the mail reaches the mailbox', async () => {
    const page = await newPage(rig)
    await signInAs(page, rig.url, sales.email, sales.password)
    await navigate(page, 'Quotes')
    await page.waitForSelector('h1 ::-p-text(Quotes)')
    await clickButton(page, 'New quote')
    await page.locator('#sizing-no').fill(String(sizingId))
    await clickButton(page, 'Open sizing')
    await page.waitForSelector(`::-p-text(${DEMO_OFFICE_SIZING})`)
    // The first unit offered is one the matcher found able to carry the sizing.
    const add = await page.waitForSelector(
      'section[aria-label="Units that can carry the sizing"] button',
    )
    const unitLabel = await add!.evaluate((b) => b.textContent?.trim() ?? '')
    expect(unitLabel).toMatch(/^Add [A-Z0-9-]+$/)
    await add!.click()
    await page.locator('#add-option').click()
    await page.locator('li[role="option"] ::-p-text(Site tuning visit)').click()
    await clickButton(page, 'Add option')
    await page.waitForSelector('section[aria-label="Quote lines"] li:nth-child(2)')
    // a bare number in a percentage field is a percentage: "0,05" is 0.05 %, 5 basis points
    await enter(page, '#q-discount', '0,05')
    await page.waitForSelector('::-p-text(= 0.05 %)')
    await shot(page, 'quotes-1-builder')
    // a double tap on save makes one quote and no error
    // other browser tests in this run may have quoted the same demo sizing: count only new ones
    const quotesOfSizing = async () =>
      (await rig.t.services.quotes.list(salesUser, { limit: 200 })).items.filter(
        (q) => q.sizingId === sizingId,
      )
    const before = new Set((await quotesOfSizing()).map((q) => q.id))
    const save = await page.waitForSelector('::-p-xpath(//button[normalize-space(.)="Save draft"])')
    await save!.click({ count: 2 })
    await page.waitForSelector('[data-state="draft"]')
    const drafts = (await quotesOfSizing()).filter((q) => !before.has(q.id))
    expect(drafts).toHaveLength(1)
    expect((await rig.t.services.quotes.get(salesUser, drafts[0]!.id)).discountBp).toBe(5)
    const heading = await page.$eval('h1', (h) => h.textContent ?? '')
    const number = /TDW-\d{4}-\d{4}/.exec(heading)?.[0]
    expect(number).toBeDefined()
    expect(await page.$$eval('[aria-label="Quote lines"] tbody tr', (r) => r.length)).toBe(2)
    const send = await page.waitForSelector(
      '::-p-xpath(//button[normalize-space(.)="Send to customer"])',
    )
    await send!.click({ count: 2 })
    await page.waitForSelector('[data-state="sent"]')
    expect(await page.$$('.p-toast-message-error')).toHaveLength(0)
    const sent = await rig.t.services.quotes.internal(drafts[0]!.id)
    expect(sent.events.filter((e) => e.toState === 'sent')).toHaveLength(1)
    await shot(page, 'quotes-2-sent')

    const box = await newPage(rig, LANDSCAPE)
    await box.goto(rig.t.mail.httpUrl)
    await box.waitForSelector(`::-p-text(Quotation ${number})`)
    const caught = rig.t.mail.messages().find((m) => m.subject.includes(number!))
    expect(caught?.to.join(',')).toContain('customer@marlowquay.test')
    expect(caught?.attachments[0]?.contentType).toBe('application/pdf')
    expect(caught?.text).toContain(`${rig.url}/portal/quotes/`)
    await shot(box, 'quotes-3-mailbox')
    await page.browserContext().close()
    await box.browserContext().close()
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
    await clickButton(page, 'Save')
    await page.waitForSelector('::-p-text(€12.50/kg)')
    const line = (await rig.t.services.catalogue.listLines('admin', true)).find(
      (l) => l.code === code,
    )
    expect(line?.prices?.EUR.perKg).toBe(1250)
    await page.browserContext().close()
  })
})
