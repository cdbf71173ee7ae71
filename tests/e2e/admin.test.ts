import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'puppeteer-core'
import { toAuthUser } from '../../server/modules/auth/auth.service'
import { closePdfRenderers } from '../../server/integrations/pdf/renderer'
import { DEMO_OFFICE_SIZING } from '../../seed/seed-sizings'
import { CUSTOMERS, DEMO_USERS } from '../../seed/demo-people'
import type { Quote } from '../../shared/schemas/quote'
import { PASSWORD, makeUser } from '../helpers/factories'
import {
  choose,
  enter,
  newPage,
  shot,
  signInAs,
  startBrowserRig,
  tapButton,
  waitForText,
  type BrowserRig,
} from '../helpers/browser'
import { seedDemoSizings } from '../helpers/demo-seed'

let rig: BrowserRig
let newQuote: () => Promise<Quote>
beforeAll(async () => {
  rig = await startBrowserRig()
  const s = rig.t.services
  await seedDemoSizings(s)
  const sales = toAuthUser((await s.users.findByEmail('sales@quellnode.test'))!)
  const [sizing] = await s.sizings.list(sales, { search: DEMO_OFFICE_SIZING })
  const unit = (await s.catalogue.match(await s.sizings.summary(sizing!.id))).find((m) => m.fits)!
  const validUntil = new Date(Date.now() + 30 * 86_400_000).toISOString().slice(0, 10)
  // a new draft as sales make it, with no rate chosen: the server picks the customer's
  newQuote = async () =>
    (await s.quotes.create(sales, {
      sizingId: sizing!.id,
      contactId: null,
      currency: 'EUR',
      discountBp: 0,
      taxRateId: null,
      validUntil,
      terms: '',
      lines: [{ kind: 'unit', productLineId: unit.productLineId, quantity: 1 }],
    })) as Quote
})
afterAll(async () => {
  await closePdfRenderers()
  await rig?.close()
})

let last: Page | null = null
afterEach(async (ctx) => {
  if (ctx.task.result?.state === 'fail' && last)
    await shot(last, `admin-failed-${ctx.task.name.slice(0, 20)}`).catch(() => undefined)
})

const admin = DEMO_USERS.find((u) => u.role === 'admin')!

describe('the admin on a tablet', () => {
  it('gives the demo customer a tax rate of its own, changes it, and the next quote’s total follows', async () => {
    const page = await newPage(rig)
    last = page
    await signInAs(page, rig.url, admin.email, admin.password)
    await page.goto(`${rig.url}/admin/tax`)
    await page.waitForSelector('h1 ::-p-text(Tax rates)')
    await tapButton(page, 'Add a rate')
    await page.waitForFunction(() => document.activeElement?.closest('[role="dialog"]'))
    await enter(page, '#tax-name', 'Harbour works')
    await enter(page, '#tax-rate', '10')
    await page.waitForSelector('::-p-text(= 10 %)')
    await tapButton(page, 'Save rate')
    await waitForText(page, 'Harbour works')
    // the dialog's closing mask takes taps until it has gone
    await page.waitForSelector('.p-dialog-mask', { hidden: true })
    const company = CUSTOMERS[0].name
    const marlow = (await rig.t.services.companies.findByName(company))!.id
    await choose(page, `tax-company-${marlow}`, 'Harbour works')
    await page.waitForFunction(
      (id) => document.querySelector(`#tax-company-${id}`)?.textContent?.includes('Harbour'),
      {},
      marlow,
    )
    const before = await newQuote()
    // 10 % of the subtotal, half up to the cent (the documented pricing rule)
    expect(before.taxBp).toBe(1000)
    expect(before.tax).toBe(Math.round(before.subtotal * 0.1))
    await shot(page, 'admin-1-tax-rate')

    // the rate is raised to 12.5 %, typed with a decimal comma as on a European keyboard
    await tapButton(page, 'Change Harbour works')
    await page.waitForFunction(() => document.activeElement?.closest('[role="dialog"]'))
    await enter(page, '#tax-rate', '12,5')
    await page.waitForSelector('::-p-text(= 12.5 %)')
    await tapButton(page, 'Save rate')
    await waitForText(page, '12.5 %')
    const after = await newQuote()
    expect(after.taxBp).toBe(1250)
    expect(after.tax).toBe(Math.round(after.subtotal * 0.125))
    expect(after.total).toBeGreaterThan(before.total)
    expect(after.total - before.total).toBe(after.tax - before.tax)
    await shot(page, 'admin-2-tax-rate-changed')
    await page.browserContext().close()
  })

  it('asks before deactivating a user, and “Keep as is” changes nothing', async () => {
    const target = await makeUser(rig.t, 'engineer')
    const page = await newPage(rig)
    last = page
    await signInAs(page, rig.url, admin.email, admin.password)
    await page.goto(`${rig.url}/admin/users`)
    await waitForText(page, target.name)
    const deactivate = async () => {
      await page.locator(`button[aria-label="Deactivate ${target.email}"]`).click()
      await page.waitForSelector('[role="alertdialog"] ::-p-text(signed out everywhere)')
    }
    await deactivate()
    await shot(page, 'admin-3-confirm-deactivate')
    await tapButton(page, 'Keep as is')
    await page.waitForSelector('[role="alertdialog"]', { hidden: true })
    expect((await rig.t.services.users.findByEmail(target.email))?.active).toBe(true)
    await deactivate()
    await page.locator('[role="alertdialog"] button ::-p-text(Deactivate)').click()
    await page.waitForFunction(
      (email) =>
        [...document.querySelectorAll('tr')].some(
          (tr) => tr.textContent?.includes(email) && tr.textContent.includes('inactive'),
        ),
      {},
      target.email,
    )
    expect((await rig.t.services.users.findByEmail(target.email))?.active).toBe(false)
    // the person is signed out of the app on their own device, too
    const theirs = await newPage(rig)
    await theirs.goto(`${rig.url}/sign-in`)
    await theirs.locator('#email').fill(target.email)
    await theirs.locator('#password').fill(PASSWORD)
    await theirs.locator('button[type="submit"]').click()
    await theirs.waitForSelector('[role="alert"]')
    await page.browserContext().close()
    await theirs.browserContext().close()
  })

  it('reads the audit trail of quotes, searchable by number', async () => {
    const page = await newPage(rig)
    last = page
    await signInAs(page, rig.url, admin.email, admin.password)
    await newQuote()
    await page.goto(`${rig.url}/admin/audit`)
    await page.waitForSelector('[aria-label="Audit entries"] li')
    const count = await page.$$eval('[aria-label="Audit entries"] li', (l) => l.length)
    expect(count).toBeGreaterThan(0)
    await enter(page, '#audit-search', 'no such thing at all')
    await waitForText(page, 'Nothing recorded matches.')
    await shot(page, 'admin-4-audit')
    await page.browserContext().close()
  })
})
