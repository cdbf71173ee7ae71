import { existsSync, readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { MAX_RECORD_BYTES } from '../../shared/schemas/measurement'
import { appWithOwnUploads } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { buildingDefinition, makeCompany, siteBody } from '../helpers/records'

const HEEL_DROP = readFileSync(path.resolve('seed/records/heel-drop-office-floor.csv'))

const t = appWithOwnUploads('records')

const storedFiles = () =>
  existsSync(t.config.UPLOAD_DIR) ? readdirSync(t.config.UPLOAD_DIR).length : 0

type Agent = Awaited<ReturnType<typeof signedIn>>['agent']

async function siteOf(agent: Agent) {
  const company = await makeCompany(t)
  return (await agent.post('/api/sites').send(siteBody(company.id))).body as { id: number }
}

function upload(agent: Agent, siteId: number, bytes: Buffer, filename = 'record.csv') {
  return agent.post(`/api/sites/${siteId}/records`).attach('record', bytes, filename)
}

describe('site measurement records', () => {
  it('identifies the peaks of an uploaded heel-drop record and lists it on the site', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = await siteOf(agent)
    const before = storedFiles()
    const res = await upload(agent, site.id, HEEL_DROP, 'heel-drop.csv')
    expect(res.status).toBe(201)
    expect(storedFiles()).toBe(before + 1)
    expect(res.body.result.peaks.length).toBeGreaterThan(0)
    expect(res.body.sampleRateHz).toBeCloseTo(200, 6)
    expect(res.body.kind).toBe('decay')
    const list = await agent.get(`/api/sites/${site.id}/records`)
    expect(list.body.map((r: { id: number }) => r.id)).toEqual([res.body.id])
    const one = await agent.get(`/api/records/${res.body.id}`)
    expect(one.body.result.spectrum.frequencyHz.length).toBeGreaterThan(10)
  })

  const refusals: [string, Buffer, string, number, RegExp][] = [
    ['a non-numeric line', Buffer.from('t,a\n0,0.1\n0.005,abc\n'), 'r.csv', 400, /line 3/],
    // a file large enough to be handed to the worker whole (not a slice of a shared buffer)
    [
      'a long record with a non-numeric last line',
      Buffer.concat([HEEL_DROP, Buffer.from('12,abc\n')]),
      'r.csv',
      400,
      new RegExp(`line ${HEEL_DROP.toString().trimEnd().split('\n').length + 1}\\b`),
    ],
    ['an empty file', Buffer.alloc(0), 'r.csv', 400, /line 1: the file is empty/],
    [
      'UTF-16 text with a byte-order mark',
      Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('t,a\n0,1\n', 'utf16le')]),
      'r.csv',
      415,
      /UTF-16/,
    ],
    ['a file not named .csv or .txt', HEEL_DROP, 'record.xlsx', 415, /\.csv/],
    ['a file over the size limit', Buffer.alloc(MAX_RECORD_BYTES + 1, '1'), 'r.csv', 413, /limit/],
  ]
  for (const [what, bytes, name, status, message] of refusals) {
    it(`refuses ${what} with ${status} and stores nothing`, async () => {
      const { agent } = await signedIn(t, 'engineer')
      const site = await siteOf(agent)
      const before = storedFiles()
      const res = await upload(agent, site.id, bytes, name)
      expect(res.status).toBe(status)
      expect(storedFiles()).toBe(before)
      expect(res.body.error.message).toMatch(message)
      expect(res.body.error.details[0].path).toBe('file.record')
      expect((await agent.get(`/api/sites/${site.id}/records`)).body).toEqual([])
    })
  }

  it('keeps no file of an upload refused for its form fields or its site', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = await siteOf(agent)
    const before = storedFiles()
    const badField = await agent
      .post(`/api/sites/${site.id}/records`)
      .field('kind', 'sideways')
      .attach('record', HEEL_DROP, 'record.csv')
    expect(badField.status).toBe(400)
    expect(badField.body.error.details[0].path).toBe('body.kind')
    expect((await upload(agent, 999_999, HEEL_DROP)).status).toBe(404)
    expect(storedFiles()).toBe(before)
  })

  it('refuses an upload from a sales user', async () => {
    const { agent: engineer } = await signedIn(t, 'engineer')
    const { agent: sales } = await signedIn(t, 'sales')
    const site = await siteOf(engineer)
    expect((await upload(sales, site.id, HEEL_DROP)).status).toBe(403)
    expect((await sales.get(`/api/sites/${site.id}/records`)).body).toEqual([])
  })

  it('lets only the engineer who uploaded a record delete it', async () => {
    const { agent: owner } = await signedIn(t, 'engineer')
    const { agent: other } = await signedIn(t, 'engineer')
    const site = await siteOf(owner)
    const rec = (await upload(owner, site.id, HEEL_DROP)).body
    const before = storedFiles()
    expect((await other.delete(`/api/records/${rec.id}`)).status).toBe(403)
    expect((await owner.delete(`/api/records/${rec.id}`)).status).toBe(204)
    expect(storedFiles()).toBe(before - 1)
    expect((await owner.get(`/api/records/${rec.id}`)).status).toBe(404)
  })

  it('drops a false peak, adds it back from the stored file, refuses one beyond the band', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = await siteOf(agent)
    const rec = (await upload(agent, site.id, HEEL_DROP)).body
    const first = rec.result.peaks[0]
    const dropped = await agent.delete(`/api/records/${rec.id}/peaks/0`)
    expect(dropped.status).toBe(200)
    expect(dropped.body.result.peaks).toHaveLength(rec.result.peaks.length - 1)
    const added = await agent
      .post(`/api/records/${rec.id}/peaks`)
      .send({ frequencyHz: first.frequencyHz * 1.01 })
    expect(added.status).toBe(201)
    // the clicked frequency is refined to the spectral peak it lies on
    expect(Math.abs(added.body.peak.frequencyHz - first.frequencyHz)).toBeLessThan(
      2 * rec.result.resolutionHz,
    )
    const again = await agent.get(`/api/records/${rec.id}`)
    expect(again.body.result.peaks).toHaveLength(rec.result.peaks.length)
    expect(
      (await agent.post(`/api/records/${rec.id}/peaks`).send({ frequencyHz: first.frequencyHz }))
        .status,
    ).toBe(409)
    // above the Nyquist frequency of a 200 Hz record: refused naming the field, nothing added
    const beyond = await agent.post(`/api/records/${rec.id}/peaks`).send({ frequencyHz: 150 })
    expect(beyond.status).toBe(400)
    expect(beyond.body.error.details[0].path).toBe('body.frequencyHz')
    expect(beyond.body.error.message).toMatch(/between 0 and 100 Hz/)
  })

  it('calibrates a model to a measured frequency as a new revision', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = await siteOf(agent)
    const model = (
      await agent
        .post('/api/models')
        .send({ siteId: site.id, name: 'Five storeys', definition: buildingDefinition() })
    ).body
    const measuredHz = 2.25
    const res = await agent
      .post(`/api/models/${model.id}/calibrate`)
      .send({ baseRevision: 1, mode: 1, measuredHz, dampingRatio: 0.015 })
    expect(res.status).toBe(201)
    expect(res.body.currentRevision).toBe(2)
    expect(res.body.revisions[1].reason).toBe('calibrated mode 1 to 2.25 Hz')
    expect(res.body.definition.hostDampingRatio).toBe(0.015)
    // Uniform shear building, n storeys fixed at the base: f₁ = (1/π)·√(k/m)·sin(π/(2(2n+1)))
    // (standard result for a uniform fixed–free spring-mass chain; from memory).
    const k = res.body.definition.springs[0].stiffness as number
    const springs = res.body.definition.springs as { stiffness: number }[]
    springs.forEach((s) => expect(s.stiffness).toBeCloseTo(k, 0))
    const f1 = (Math.sqrt(k / 200_000) * Math.sin(Math.PI / 22)) / Math.PI
    expect(Math.abs(f1 - measuredHz) / measuredHz).toBeLessThan(1e-6)
    const stale = await agent
      .post(`/api/models/${model.id}/calibrate`)
      .send({ baseRevision: 1, mode: 1, measuredHz: 3 })
    expect(stale.status).toBe(409)
    const noMode = await agent
      .post(`/api/models/${model.id}/calibrate`)
      .send({ baseRevision: 2, mode: 9, measuredHz: 3 })
    expect(noMode.status).toBe(400)
    expect(noMode.body.error.details[0].path).toBe('body.mode')
  })
})
