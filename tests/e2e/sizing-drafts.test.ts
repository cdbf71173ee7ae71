import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'puppeteer-core'
import { seedPeople } from '../../seed/seed-people'
import { DEMO_USERS } from '../../seed/demo-people'
import {
  DEMO_FOOTBRIDGE_SITE,
  DEMO_OFFICE_SITE,
  DEMO_OFFICE_SIZING,
  seedSizings,
} from '../../seed/seed-sizings'
import { newPage, shot, signInAs, startBrowserRig, type BrowserRig } from '../helpers/browser'

let rig: BrowserRig
beforeAll(async () => {
  rig = await startBrowserRig()
  const { companyIds } = await seedPeople(rig.t.services)
  await seedSizings(rig.t.services, { companyIds })
  await seedSizings(rig.t.services, { companyIds })
})
afterAll(() => rig?.close())

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!

async function waitForText(page: Page, needle: string) {
  await page.waitForFunction(
    (n) => document.querySelector('main')?.textContent?.includes(n),
    {},
    needle,
  )
}

async function openStep(page: Page, name: string) {
  for (const t of await page.$$('button[role="tab"]')) {
    if ((await t.evaluate((e) => e.textContent ?? '')).includes(name)) return t.click()
  }
  throw new Error(`no step ${name}`)
}

async function openSizing(page: Page, title: string) {
  await page.goto(`${rig.url}/sizings`)
  const link = await page.locator(`::-p-aria([name="${title}"][role="link"])`).waitHandle()
  // a DOM click: the centre of a link wrapped over several lines can fall between its lines
  await link.evaluate((a) => (a as HTMLAnchorElement).click())
  await page.waitForSelector('#sizing-title')
}

describe('demo sizings, drafts and hand-over in Chromium', () => {
  it('seeds the demo sites once however often the seed runs', async () => {
    for (const name of [DEMO_OFFICE_SITE, DEMO_FOOTBRIDGE_SITE]) {
      const found = await rig.t.services.sites.list({ search: name })
      expect(found.filter((s) => s.name === name)).toHaveLength(1)
    }
  })

  it("shows sales the handed-over demo sizing read-only with the server's result", async () => {
    const page = await newPage(rig)
    await signInAs(page, rig.url, demo('sales').email, demo('sales').password)
    await openSizing(page, DEMO_OFFICE_SIZING)
    await waitForText(page, 'Read-only')
    expect(await page.$eval('#sizing-title', (e) => (e as HTMLInputElement).disabled)).toBe(true)
    await openStep(page, 'Results')
    await waitForText(page, "The server's stored result")
    // The seeded office floor meets 0.5 %g with a 2 % absorber (see seed/seed-sizings.ts).
    await waitForText(page, 'Meets the limit')
    await shot(page, 'sizing-sales-read-only')
    await page.browserContext().close()
  })

  it('keeps an edit through a reload and syncs a save made offline when back online', async () => {
    const page = await newPage(rig)
    await signInAs(page, rig.url, demo('engineer').email, demo('engineer').password)
    await openSizing(page, 'Millrace footbridge vertical absorber')
    const id = Number(/\/sizings\/(\d+)/.exec(page.url())?.[1])
    await page.locator('#sizing-title').fill('Millrace footbridge, mid-span absorber')
    await waitForText(page, 'Unsaved changes')
    await page.reload()
    await page.waitForSelector('#sizing-title')
    expect(await page.$eval('#sizing-title', (e) => (e as HTMLInputElement).value)).toBe(
      'Millrace footbridge, mid-span absorber',
    )

    await page.setOfflineMode(true)
    await waitForText(page, 'Offline — will sync')
    await openStep(page, 'Hand over')
    await page.locator('::-p-aria([name="Save sizing"][role="button"])').click()
    await waitForText(page, 'it goes to the server when back online')
    await shot(page, 'sizing-offline')
    expect((await rig.t.services.sizings.summary(id)).revision).toBe(1)

    await page.setOfflineMode(false)
    await waitForText(page, 'Saved as revision 2, computed on the server')
    const stored = await rig.t.services.sizings.summary(id)
    expect(stored.title).toBe('Millrace footbridge, mid-span absorber')
    expect(stored.revision).toBe(2)
    await page.browserContext().close()
  })
})
