import { beforeAll, describe, expect, it } from 'vitest'
import type { Page } from 'puppeteer-core'
import { DEMO_USERS } from '../../seed/demo-people'
import {
  DEMO_FOOTBRIDGE_SITE,
  DEMO_OFFICE_SITE,
  DEMO_OFFICE_SIZING,
  seedSizings,
} from '../../seed/seed-sizings'
import { toAuthUser } from '../../server/modules/auth/auth.service'
import {
  browserRigPerFile,
  choose,
  enter,
  openStep,
  pageSignedInAs,
  shot,
  valueOf,
  waitForText,
} from '../helpers/browser'
import { engineerOnSizing, reopen } from '../helpers/sizing-on-span'
import { seedDemoSizings } from '../helpers/demo-seed'

const rig = browserRigPerFile()
beforeAll(async () => {
  const { companyIds } = await seedDemoSizings(rig.t.services)
  await seedSizings(rig.t.services, { companyIds }) // a second run adds nothing
})

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!

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
    const page = await pageSignedInAs(rig, demo('sales'))
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

  it('opens the workspace without signal after one visit, keeps the offline save, and asks before overwriting a newer server version', async () => {
    const page = await pageSignedInAs(rig, demo('engineer'))
    await openSizing(page, 'Millrace footbridge vertical absorber')
    const id = Number(/\/sizings\/(\d+)/.exec(page.url())?.[1])
    // the service worker has cached the app shell once it controls the page (slow on a busy
    // machine: it downloads the whole client once)
    await page.waitForFunction(() => navigator.serviceWorker.controller !== null, {
      timeout: 90_000,
    })
    await page.locator('#sizing-title').fill('Millrace footbridge, mid-span absorber')
    await waitForText(page, 'Unsaved changes')

    await page.setOfflineMode(true)
    await page.reload()
    await page.waitForSelector('#sizing-title')
    expect(await page.$eval('#sizing-title', (e) => (e as HTMLInputElement).value)).toBe(
      'Millrace footbridge, mid-span absorber',
    )
    await waitForText(page, 'No connection: this is the copy kept on this tablet')
    await waitForText(page, 'Offline — will sync')
    await openStep(page, 'Hand over')
    await page.locator('::-p-aria([name="Save sizing"][role="button"])').click()
    await waitForText(page, 'it goes to the server when back online')
    await shot(page, 'sizing-offline')
    expect((await rig.t.services.sizings.summary(id)).revision).toBe(1)

    // Meanwhile someone saves a newer revision on the server.
    const s = rig.t.services
    const owner = toAuthUser((await s.users.findByEmail(demo('engineer').email))!)
    const server = await s.sizings.view(owner, id)
    await s.sizings.save(owner, id, {
      baseRevision: 1,
      input: { ...server.input, massRatio: 0.035 },
    })

    await page.setOfflineMode(false)
    const dialog = await page.waitForSelector('[role="dialog"] ::-p-text(newer version)')
    expect(await dialog!.evaluate((e) => e.closest('[role="dialog"]')?.textContent)).toContain(
      'Your version differs in: Title, Mass ratio',
    )
    await shot(page, 'sizing-sync-conflict')
    expect((await s.sizings.summary(id)).revision).toBe(2)
    await page.locator('::-p-aria([name="Keep my version"][role="button"])').click()
    await waitForText(page, 'Saved as revision 3, computed on the server')
    const stored = await s.sizings.view(owner, id)
    expect(stored.title).toBe('Millrace footbridge, mid-span absorber')
    expect(stored.input.massRatio).toBe(0.03)
    expect((await s.sizings.view(owner, id, 2)).input.massRatio).toBe(0.035)
    await page.browserContext().close()
  }, 150_000)

  it('reads every kind of numeric field as typed, saves once on a double tap and reopens each input as entered', async () => {
    const { sizing, modelId, page, agent, base } = await engineerOnSizing(rig)
    await page.goto(`${base}/structure`)
    await page.waitForSelector('#sizing-title')

    // Host damping one per mode: a bare number in a % field is a percentage; "0,05" is 0.05 %.
    await page.locator('::-p-text(One per mode)').click()
    await enter(page, '#host-damping-1', '5')
    await enter(page, '#host-damping-2', '0,05')
    await waitForText(page, '= 0.05 %')
    await page.locator('#model-reason').fill('damping per mode from the heel-drop tests')

    await openStep(page, 'Target')
    await page.waitForFunction(() => location.pathname.endsWith('/target'))
    await page.locator('::-p-text(Set the band)').click()
    await enter(page, '#band-min', '1')
    await enter(page, '#band-max', '6,3 Hz')
    await choose(page, 'limit-preset', 'Custom limit')
    await enter(page, '#limit-value', '1,5 %g')
    await waitForText(page, '= 0.14709975 m/s²')

    await openStep(page, 'Absorber')
    await enter(page, '#mass-ratio', '5 %')
    await choose(page, 'tuning', 'Given by the engineer')
    await enter(page, '#tuning-ratio', '0,95')
    await enter(page, '#tuning-damping', '8')
    await enter(page, '#detuning-tolerance', '7,5')
    await waitForText(page, 'Mass ratio: 5 %')
    await shot(page, 'inputs-1-absorber')

    // A double tap on save makes one request: one new revision and no error.
    await openStep(page, 'Hand over')
    const save = await page.waitForSelector('::-p-aria([name="Save sizing"][role="button"])')
    await save!.click({ count: 2 })
    await waitForText(page, 'Saved as revision 2, computed on the server')
    expect(await page.$$('.p-toast-message-error')).toHaveLength(0)

    const stored = (await agent.get(`/api/sizings/${sizing.id}`)).body
    expect(stored.currentRevision).toBe(2)
    expect(stored.input).toMatchObject({
      modelRevision: 2,
      massRatio: 0.05,
      tuning: { frequencyRatio: 0.95, dampingRatio: 0.08 },
      detuningTolerance: 0.075,
      band: { minHz: 1, maxHz: 6.3 },
    })
    // 1.5 %g = 0.015 × 9.80665 m/s² (standard gravity, CGPM 1901)
    expect(stored.input.acceptance.limit).toBeCloseTo(0.015 * 9.80665, 12)
    const model = (await agent.get(`/api/models/${modelId}/revisions/2`)).body
    expect(model.definition.hostDampingRatio).toEqual([0.05, 0.0005, 0.02])

    // Reopened from the server alone, every field shows what was entered.
    await reopen(page, `${base}/absorber`, '#mass-ratio')
    const entered = {
      '#mass-ratio': '5 %',
      '#tuning-ratio': '0.95',
      '#tuning-damping': '8 %',
      '#detuning-tolerance': '7.5 %',
      '#band-max': '6.3 Hz',
      '#limit-value': '0.14709975 m/s²',
      '#host-damping-1': '5 %',
      '#host-damping-2': '0.05 %',
    }
    for (const [field, text] of Object.entries(entered))
      expect(await valueOf(page, field)).toBe(text)
    await page.browserContext().close()
  })
})
