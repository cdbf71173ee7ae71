import { describe, expect, it } from 'vitest'
import { seedCatalogue } from '../../seed/seed-catalogue'
import { makeUser, signedIn } from '../helpers/factories'
import { makeCompany } from '../helpers/records'
import {
  choose,
  LANDSCAPE,
  mainText,
  pageSignedInAs,
  openStep,
  PORTRAIT,
  shot,
  browserRigPerFile,
  waitForText,
} from '../helpers/browser'

const rig = browserRigPerFile()

describe.each([
  ['portrait', PORTRAIT],
  ['landscape', LANDSCAPE],
])('the sizing workspace on a %s tablet, in Chromium', (tag, viewport) => {
  it('takes an engineer from a new site to a sizing handed over to sales', async () => {
    const engineer = await makeUser(rig.t, 'engineer')
    const company = await makeCompany(rig.t)
    const page = await pageSignedInAs(rig, engineer, viewport)

    await page.goto(`${rig.url}/sites`)
    await page.locator('::-p-aria([name="New site"][role="button"])').click()
    await page.locator('#site-name').fill(`Five-storey block ${tag}`)
    await choose(page, 'site-company', company.name)
    await choose(page, 'site-kind', 'building')
    await shot(page, `sizing-${tag}-0-site`)
    await page.locator('::-p-aria([name="Save site"][role="button"])').click()
    await page.waitForFunction(() => /\/sites\/\d+$/.test(location.pathname))
    await page.locator('::-p-aria([name="New sizing"][role="button"])').click()

    // Step 1: five storeys from the template, saved as the site's model.
    await page.locator('#sizing-title').fill('Roof sway absorber')
    await choose(page, 'tpl-kind', 'Shear building')
    await page.locator('::-p-aria([name="Build from template"][role="button"])').click()
    await page.waitForSelector('::-p-aria([name="Node storey-5"])')
    await page.locator('::-p-aria([name="Save structure"][role="button"])').click()
    await waitForText(page, 'Saved as model revision 1')
    await shot(page, `sizing-${tag}-1-structure`)

    // Step 3: mode 1, with the attachment suggested at the roof (largest |φ| of mode 1).
    await openStep(page, 'Target')
    await page.waitForSelector('#mode-1:checked')
    await page.waitForSelector('[aria-label="Mode shape chart"] .apexcharts-series path')
    await waitForText(page, 'Largest |φ| of mode 1: storey-5')
    expect(await page.$eval('#absorber-node', (e) => e.textContent)).toContain('storey-5')
    await shot(page, `sizing-${tag}-3-target`)

    // Step 4: 2 % of the effective mass.
    await openStep(page, 'Absorber')
    await page.locator('::-p-aria([name="Mass ratio"][role="textbox"])').fill('2 %')
    await page.keyboard.press('Enter')
    await waitForText(page, 'Mass ratio: 2 %')
    await page.waitForSelector('[aria-label^="Frequency response"] .apexcharts-series path')
    await page.waitForSelector('[aria-label^="Achievable reduction"] .apexcharts-series path')
    await shot(page, `sizing-${tag}-4-absorber`)

    // Step 5: the live preview's reduction.
    await openStep(page, 'Results')
    await waitForText(page, 'Reduction')
    await page.waitForSelector('[aria-label="Detuning robustness"] .apexcharts-series path')
    const preview = /peak ÷ (\d+\.\d\d)/.exec(await mainText(page))?.[1]
    expect(Number(preview)).toBeGreaterThan(1)
    await shot(page, `sizing-${tag}-5-results`)

    // Step 6: saved on the server, then handed over to sales.
    await openStep(page, 'Hand over')
    await page.locator('::-p-aria([name="Save sizing"][role="button"])').click()
    await waitForText(page, 'Saved as revision 1, computed on the server')
    await page.waitForFunction(() => /\/sizings\/\d+/.test(location.pathname))
    const id = Number(/\/sizings\/(\d+)/.exec(page.url())?.[1])
    const stored = await rig.t.services.sizings.summary(id)
    // The server's solve and the browser's preview are the same function on the same input.
    expect(stored.reduction?.toFixed(2)).toBe(preview)
    expect(stored.absorber.mass).toBeCloseTo(0.02 * stored.effectiveMass, 6)
    await shot(page, `sizing-${tag}-6-saved`)
    // A 10 t class absorber: no catalogue unit carries it, so the handover asks for a reason.
    await waitForText(page, 'Catalogue unit: fails.')
    await page.locator('#handover-note').fill('Roof access by the east stair.')
    await page.locator('::-p-aria([name="Submit to sales"][role="button"])').click()
    await page.waitForSelector('#handover-reason-error')
    expect(await page.$eval('#handover-reason-error', (e) => e.textContent)).toBe(
      'say in a sentence why the design is handed over anyway',
    )
    expect((await rig.t.services.sizings.summary(id)).state).toBe('draft')
    await page.locator('#handover-reason').fill(REASON)
    await shot(page, `sizing-${tag}-6b-reason`)
    await page.locator('::-p-aria([name="Submit to sales"][role="button"])').click()
    await waitForText(page, 'Handed over to sales')
    await waitForText(page, `Reason given: ${REASON}`)
    await page.waitForSelector('::-p-aria([name="Reopen to revise"][role="button"])')
    expect((await rig.t.services.sizings.summary(id)).state).toBe('submitted')
    expect(await page.$eval('#sizing-title', (e) => (e as HTMLInputElement).disabled)).toBe(true)
    await shot(page, `sizing-${tag}-7-handed-over`)
    await page.browserContext().close()
    if (tag === 'portrait') await quoteScreenShowsAcknowledgement(id, company.id)
  })
})

const REASON = 'Custom frame absorber designed with the structural engineer of record.'

/** Sales open a quote of the sizing, read the acknowledgement and confirm it to send. */
async function quoteScreenShowsAcknowledgement(sizingId: number, companyId: number) {
  await seedCatalogue(rig.t.services)
  const contact = await rig.t.services.customers.addContact(companyId, {
    name: 'Priya Nair',
    email: `priya-${sizingId}@client.test`,
    phone: '',
    position: 'Estates manager',
  })
  const { agent, user } = await signedIn(rig.t, 'sales')
  const options = (await agent.get('/api/catalogue/options')).body as { id: number }[]
  const quote = await agent.post('/api/quotes').send({
    sizingId,
    contactId: contact.id,
    validUntil: new Date(Date.now() + 20 * 86_400_000).toISOString().slice(0, 10),
    lines: [{ kind: 'option', optionId: options[0]!.id, quantity: 1 }],
  })
  expect(quote.status).toBe(201)
  const page = await pageSignedInAs(rig, user)
  await page.goto(`${rig.url}/quotes/${quote.body.id}`)
  await waitForText(page, 'Design checks not met')
  await waitForText(page, `Reason given: ${REASON}`)
  await page.locator('::-p-aria([name="Send to customer"][role="button"])').click({ count: 2 })
  await page.waitForSelector('::-p-text(Send a design that fails checks?)')
  await shot(page, 'sizing-portrait-8-quote-confirm')
  await page.locator('::-p-aria([name="Confirm and send"][role="button"])').click({ count: 2 })
  await page.waitForSelector('[data-state="sent"]')
  await waitForText(page, 'before sending')
  await shot(page, 'sizing-portrait-9-quote-sent')
  expect(await page.$$('.p-toast-message-error')).toHaveLength(0)
  const events = (await agent.get(`/api/quotes/${quote.body.id}`)).body.events as {
    toState: string
  }[]
  expect(events.filter((e) => e.toState === 'sent')).toHaveLength(1)
  await page.browserContext().close()
}
