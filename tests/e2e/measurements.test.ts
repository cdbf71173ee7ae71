import { readFileSync } from 'node:fs'
import path from 'node:path'
import { singleModeModel } from '../../shared/dynamics'
import { expect, it } from 'vitest'
import { signedIn } from '../helpers/factories'
import { mainText, pageSignedInAs, shot, browserRigPerFile, waitForText } from '../helpers/browser'
import { buildingDefinition, makeCompany, siteBody, sizingInput } from '../helpers/records'

const rig = browserRigPerFile()

it('lets an engineer upload a heel-drop record, see its peaks and calibrate a model', async () => {
  const { agent, user: engineer } = await signedIn(rig.t, 'engineer')
  const company = await makeCompany(rig.t)
  const site = (await agent.post('/api/sites').send(siteBody(company.id))).body
  const model = await agent
    .post('/api/models')
    .send({ siteId: site.id, name: 'Office floor bays', definition: buildingDefinition() })
  expect(model.status).toBe(201)

  const page = await pageSignedInAs(rig, engineer)
  await page.goto(`${rig.url}/sites/${site.id}/records`)
  const input = await page.waitForSelector('input[type=file]')
  await input!.uploadFile(path.resolve('seed/records/heel-drop-office-floor.csv'))
  await page.locator('button ::-p-text(Upload and analyse)').click()
  await page.waitForSelector('.apexcharts-canvas')
  await page.waitForSelector('[data-test="peaks-table"] tbody tr td')
  const rows = await page.$$eval('[data-test="peaks-table"] tbody tr', (trs) => trs.length)
  expect(rows).toBeGreaterThan(0)
  expect(await page.$$eval('[data-test="peaks-table"] tbody', (b) => b[0]?.textContent)).toMatch(
    /\d+\.\d{3} Hz/,
  )
  await shot(page, 'measurements-1-spectrum')

  await page.locator('button ::-p-text(Calibrate and save revision)').click()
  await page.waitForSelector('::-p-text(Saved as revision 2)')
  await shot(page, 'measurements-2-calibrated')
  const after = await agent.get(`/api/models/${model.body.id}`)
  expect(after.body.currentRevision).toBe(2)
})

it('calibrates from step 2 of a sizing, shows model against measurement before and after, and moves the sizing only when asked', async () => {
  const { agent, user: engineer } = await signedIn(rig.t, 'engineer')
  const site = (await agent.post('/api/sites').send(siteBody((await makeCompany(rig.t)).id))).body
  // one floor mode at 5.8 Hz, 20 t modal mass; the heel-drop record peaks near 6.29 Hz
  const floor = singleModeModel(5.8, 20_000)
  const definition = { nodes: floor.nodes, springs: floor.springs, hostDampingRatio: 0.02 }
  const model = (
    await agent.post('/api/models').send({ siteId: site.id, name: 'Floor bay', definition })
  ).body
  await agent
    .post(`/api/sites/${site.id}/records`)
    .attach('record', readFileSync('seed/records/heel-drop-office-floor.csv'), 'heel-drop.csv')
  const node = floor.nodes.find((n) => !n.fixed)!.id
  const input = sizingInput(site.id, model.id, {
    absorberNode: node,
    excitationNode: node,
    responseNode: node,
  })
  const sizing = (await agent.post('/api/sizings').send({ input })).body

  const page = await pageSignedInAs(rig, engineer)
  const base = `${rig.url}/sizings/${sizing.id}`
  await page.goto(`${base}/records`)
  await page.locator('::-p-aria([name="Use heel-drop.csv for this sizing"])').click()
  await page.locator('[aria-label^="Host mode of the 6.29"]').click()
  await page.locator('li[role="option"][aria-label^="mode 1"]').click()
  await waitForText(page, 'After calibration (preview)')
  expect(await mainText(page)).toMatch(/5\.800 Hz \(-7\.\d %\)/)
  await page.locator('::-p-text(Calibrate: save as a new model revision)').click()
  await waitForText(page, 'This sizing still uses revision 1')
  expect((await agent.get(`/api/models/${model.id}`)).body.currentRevision).toBe(2)
  expect((await agent.get(`/api/sizings/${sizing.id}`)).body.input.modelRevision).toBe(1)
  await page.locator('::-p-text(Use revision 2 for this sizing)').click()
  await waitForText(page, 'Model, revision 2 (in use)')
  const table = await page.$eval('[data-test="calibration-table"]', (t) => t.textContent ?? '')
  expect(table).toContain('Before: revision 1')
  expect(table).toMatch(/6\.29\d Hz \(0\.0 %\)/)
  await shot(page, 'measurements-3-sizing-calibrated')

  // Each step has its own address: the target step previews the calibrated frequency…
  await page.locator('button[role="tab"] ::-p-text(Target)').click()
  await page.waitForFunction(() => location.pathname.endsWith('/target'))
  await waitForText(page, '6.29')
  // …and Back returns to the records step, which a reload keeps.
  await page.goBack()
  await page.waitForFunction(() => location.pathname.endsWith('/records'))
  await page.reload()
  await page.waitForSelector('[data-test="calibration-table"]', { visible: true })

  await page.goto(`${base}/handover`)
  await page.locator('::-p-aria([name="Save sizing"][role="button"])').click()
  await waitForText(page, 'Saved as revision 2, computed on the server')
  const saved = (await agent.get(`/api/sizings/${sizing.id}`)).body
  expect(saved.input.modelRevision).toBe(2)
  expect(saved.input.records[0].peaks[0]).toMatchObject({ mode: 1 })
  expect(saved.evaluation.result.modes[0].frequencyHz).toBeCloseTo(
    saved.input.records[0].peaks[0].frequencyHz,
    9,
  )
  await page.browserContext().close()
})
