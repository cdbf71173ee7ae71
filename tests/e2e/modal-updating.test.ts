import { mkdtempSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { expect, it } from 'vitest'
import { signedIn } from '../helpers/factories'
import { mainText, pageSignedInAs, shot, browserRigPerFile, waitForText } from '../helpers/browser'
import { chainDefinition, chainRecordCsv, chainTruth, TRUE_SCALE } from '../helpers/chain-record'
import { makeCompany, siteBody, sizingInput } from '../helpers/records'

// The record is the seeded ambient response of a three-mass chain whose modes are known in
// closed form (tests/helpers/chain-record); the model as drawn is 10 % too soft.
const rig = browserRigPerFile()

it('takes a three-channel ambient record to an updated model and sizes on its revision', async () => {
  const { agent, user: engineer } = await signedIn(rig.t, 'engineer')
  const site = (await agent.post('/api/sites').send(siteBody((await makeCompany(rig.t)).id))).body
  const model = (
    await agent
      .post('/api/models')
      .send({ siteId: site.id, name: 'Gallery chain', definition: chainDefinition() })
  ).body
  const nodes = { absorberNode: 'm2', excitationNode: 'm2', responseNode: 'm2' }
  const sizing = (
    await agent.post('/api/sizings').send({ input: sizingInput(site.id, model.id, nodes) })
  ).body
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'qn-oma-')), 'gallery-ambient.csv')
  writeFileSync(file, chainRecordCsv())

  const page = await pageSignedInAs(rig, engineer)
  await page.goto(`${rig.url}/sites/${site.id}/records`)
  await (await page.waitForSelector('input[type=file]'))!.uploadFile(file)
  await page.locator('button ::-p-text(Upload and analyse)').click()
  await page.waitForSelector('[data-test="record-history"] .apexcharts-canvas')
  await waitForText(page, 'The time column was read in seconds, as its heading says.')
  expect(await mainText(page)).toContain('3 channel(s)')

  // each channel on its mass
  for (const [channel, node] of [
    ['a_m1', 'm1'],
    ['a_m2', 'm2'],
    ['a_m3', 'm3'],
  ]) {
    await page.locator(`[aria-label="Node of channel ${channel}"]`).click()
    await page.locator(`li[role="option"][aria-label="${node}"]`).click()
  }
  await page.locator('button ::-p-text(Save channel positions)').click()
  await waitForText(page, 'Channel positions saved on Gallery chain.')
  await shot(page, 'oma-1-channels')

  // covariance SSI with its stabilisation diagram, then FDD, whose modes update the model
  await page.locator('::-p-text(Covariance SSI)').click()
  await page.locator('button ::-p-text(Identify modes)').click()
  await page.waitForSelector('[data-test="stability-chart"] .apexcharts-canvas')
  await shot(page, 'oma-2-ssi')
  await page.locator('::-p-text(FDD with EFDD damping)').click()
  await page.locator('button ::-p-text(Identify modes)').click()
  await page.waitForFunction(() => !document.querySelector('[data-test="stability-chart"]'))
  const rows = await page.$$eval('[data-test="modes-table"] tbody tr', (trs) =>
    trs.map((tr) => tr.children[1]?.textContent ?? ''),
  )
  expect(rows).toHaveLength(3)
  chainTruth().forEach((mode, i) => {
    const hz = Number(/(\d+\.\d{3}) Hz/.exec(rows[i]!)?.[1])
    expect(Math.abs(hz / mode.frequencyHz - 1)).toBeLessThan(0.01)
  })

  await page.locator('button ::-p-text(Preview the update)').click()
  await page.waitForSelector('[data-test="update-table"]')
  const factor = Number(/× (\d\.\d{4})/.exec(await mainText(page))?.[1])
  expect(Math.abs(factor / TRUE_SCALE - 1)).toBeLessThan(0.01)
  await page.locator('button ::-p-text(Save as revision 2)').click()
  await waitForText(page, 'Saved as revision 2 of Gallery chain.')
  await shot(page, 'oma-3-updated')
  const revision = (await agent.get(`/api/models/${model.id}/revisions/2`)).body
  expect(revision.reason).toMatch(/FDD\/EFDD/)

  // step 2 of the sizing: link the record, take its first identified mode as mode 1, move on
  await page.goto(`${rig.url}/sizings/${sizing.id}/records`)
  await page.locator('::-p-aria([name="Use gallery-ambient.csv for this sizing"])').click()
  await waitForText(page, 'mode (FDD)')
  await page.locator('[aria-label^="Host mode of the"]').click()
  await page.locator('li[role="option"][aria-label^="mode 1"]').click()
  await page.locator('::-p-text(Use revision 2 for this sizing)').click()
  await waitForText(page, 'Model, revision 2 (in use)')
  await shot(page, 'oma-4-sizing-step-2')

  await page.goto(`${rig.url}/sizings/${sizing.id}/handover`)
  await page.locator('::-p-aria([name="Save sizing"][role="button"])').click()
  await waitForText(page, 'computed on the server')
  const saved = (await agent.get(`/api/sizings/${sizing.id}`)).body
  expect(saved.input.modelRevision).toBe(2)
  const f1 = saved.evaluation.result.modes[0].frequencyHz
  expect(Math.abs(f1 / chainTruth()[0]!.frequencyHz - 1)).toBeLessThan(0.01)
  await page.browserContext().close()
})
