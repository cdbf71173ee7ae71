import path from 'node:path'
import request from 'supertest'
import { afterAll, beforeAll, expect, it } from 'vitest'
import { PASSWORD, makeUser } from '../helpers/factories'
import { newPage, shot, signInAs, startBrowserRig, type BrowserRig } from '../helpers/browser'
import { buildingDefinition, makeCompany, siteBody } from '../helpers/records'

let rig: BrowserRig
beforeAll(async () => {
  rig = await startBrowserRig()
})
afterAll(() => rig?.close())

it('lets an engineer upload a heel-drop record, see its peaks and calibrate a model', async () => {
  const engineer = await makeUser(rig.t, 'engineer')
  const agent = request.agent(rig.t.app)
  await agent.post('/api/auth/sign-in').send({ email: engineer.email, password: PASSWORD })
  const company = await makeCompany(rig.t)
  const site = (await agent.post('/api/sites').send(siteBody(company.id))).body
  const model = await agent
    .post('/api/models')
    .send({ siteId: site.id, name: 'Office floor bays', definition: buildingDefinition() })
  expect(model.status).toBe(201)

  const page = await newPage(rig)
  await signInAs(page, rig.url, engineer.email, PASSWORD)
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
