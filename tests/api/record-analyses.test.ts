import request from 'supertest'
import { describe, expect, it } from 'vitest'
import { mac } from '../../shared/measurements'
import { appWithOwnUploads } from '../helpers/app'
import { chainDefinition, chainRecordCsv, chainTruth, TRUE_SCALE } from '../helpers/chain-record'
import { expectRefusedFields, signedIn } from '../helpers/factories'
import { siteWithModel } from '../helpers/records'

// The record: ambient response of a uniform three-mass chain whose modes are known in closed
// form (tests/helpers/chain-record). Methods: FDD/EFDD (Brincker, Zhang & Andersen 2001),
// SSI-COV (Peeters & De Roeck 1999), MAC (Allemang & Brown 1982), updating on eigenvalue
// sensitivities (Fox & Kapoor 1968). The app's tolerances here are looser than the engine's own
// tests (a 300 s record): frequency 1 %, MAC ≥ 0.95.
const CSV = chainRecordCsv()
const t = appWithOwnUploads('oma')

type Agent = Awaited<ReturnType<typeof signedIn>>['agent']

async function setUp(agent: Agent) {
  const chain = { name: 'Gallery chain', definition: chainDefinition() }
  const { site, model } = await siteWithModel(t, agent, chain, {})
  const record = await agent
    .post(`/api/sites/${site.id}/records`)
    .attach('record', CSV, 'gallery-ambient.csv')
  expect(record.status).toBe(201)
  return { site, model, record: record.body }
}

const MAPPING = (modelId: number) => ({
  modelId,
  channels: ['m1', 'm2', 'm3'].map((nodeId) => ({ nodeId, direction: '+z' })),
})

describe('records with several channels', () => {
  it('keeps every channel of an upload with its header name and the time unit it read', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { record } = await setUp(agent)
    expect(record.channels.map((c: { name: string }) => c.name)).toEqual(['a_m1', 'a_m2', 'a_m3'])
    expect(record.timeUnit).toBe('s')
    expect(record.timeUnitSource).toBe('header')
    expect(record.sampleRateHz).toBeCloseTo(40, 9)
  })

  it('reads a time column in ms from its step, warns in plain words, and honours a unit given', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site } = await setUp(agent)
    const ms = chainRecordCsv({ ms: true, unitInHeader: false })
    // a 25 ms step read as seconds would be 0.04 Hz sampling: surely milliseconds
    const res = await agent.post(`/api/sites/${site.id}/records`).attach('record', ms, 'ms.csv')
    expect(res.status).toBe(201)
    expect(res.body.timeUnit).toBe('ms')
    expect(res.body.timeUnitSource).toBe('step')
    expect(res.body.sampleRateHz).toBeCloseTo(40, 9)
    expect(res.body.result.warnings.join(' ')).toMatch(/read in milliseconds/)
    const asked = await agent
      .post(`/api/sites/${site.id}/records`)
      .field('timeUnit', 's')
      .attach('record', chainRecordCsv({ unitInHeader: false }), 's.csv')
    expect(asked.body.timeUnitSource).toBe('option')
    const wrong = await agent
      .post(`/api/sites/${site.id}/records`)
      .field('timeUnit', 'minutes')
      .attach('record', CSV, 'x.csv')
    expect(wrong.status).toBe(400)
    expect(wrong.body.error.details[0].path).toBe('body.timeUnit')
  })

  it('maps channels to model nodes and refuses a bad mapping naming the field', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { model, record } = await setUp(agent)
    const ok = await agent.put(`/api/records/${record.id}/channels`).send(MAPPING(model.id))
    expect(ok.status).toBe(200)
    expect(ok.body.modelId).toBe(model.id)
    expect(ok.body.channels.map((c: { nodeId: string }) => c.nodeId)).toEqual(['m1', 'm2', 'm3'])
    const bad = [
      [{ ...MAPPING(model.id), channels: MAPPING(model.id).channels.slice(0, 2) }, 'body.channels'],
      [
        {
          modelId: model.id,
          channels: [{ nodeId: 'left', direction: '+z' }, ...MAPPING(model.id).channels.slice(1)],
        },
        'body.channels.0.nodeId',
      ],
      [
        {
          modelId: model.id,
          channels: [{ nodeId: 'm1', direction: 'up' }, ...MAPPING(model.id).channels.slice(1)],
        },
        'body.channels.0.direction',
      ],
      [{ ...MAPPING(model.id), modelId: 2147483647 }, 'body.modelId'],
      [{ ...MAPPING(model.id), modelId: null }, 'body.channels.0.nodeId'],
    ] as const
    await expectRefusedFields((b) => agent.put(`/api/records/${record.id}/channels`).send(b), bad)
  })

  it('answers a time history of every channel, thinned with the extremes kept', async () => {
    const { agent } = await signedIn(t, 'sales')
    const engineer = await signedIn(t, 'engineer')
    const { record } = await setUp(engineer.agent)
    const res = await agent.get(`/api/records/${record.id}/history?points=1000`)
    expect(res.status).toBe(200)
    expect(res.body.channels).toHaveLength(3)
    expect(res.body.timeS.length).toBeLessThanOrEqual(1000)
    const rows = CSV.toString().trim().split('\n').slice(1)
    const peak = Math.max(...rows.map((l) => Math.abs(Number(l.split(',')[1]))))
    expect(Math.max(...res.body.channels[0].values.map(Math.abs))).toBe(peak)
    expect((await agent.get(`/api/records/${record.id}/history?points=5`)).status).toBe(400)
  })
})

/** An FDD/EFDD analysis of a record, as the engineer runs it. */
async function fddAnalysis(agent: Agent, recordId: number) {
  const res = await agent.post(`/api/records/${recordId}/analyses`).send({ method: 'fdd' })
  expect(res.status).toBe(201)
  return res.body as { id: number }
}

describe('operational modal analysis and model updating', () => {
  it('identifies the chain by FDD/EFDD and by SSI-COV, with shapes at the three channels', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, record } = await setUp(agent)
    const truth = chainTruth()
    for (const method of ['fdd', 'ssi'] as const) {
      const res = await agent
        .post(`/api/records/${record.id}/analyses`)
        .send({ method, minFrequencyHz: 1 })
      expect(res.status, method).toBe(201)
      expect(res.body.method).toBe(method)
      expect(res.body.modes).toHaveLength(3)
      truth.forEach((mode, i) => {
        const got = res.body.modes[i]
        expect(Math.abs(got.frequencyHz / mode.frequencyHz - 1)).toBeLessThan(0.01)
        expect(mac(got.shape, mode.shape)).toBeGreaterThanOrEqual(0.95)
        expect(got.flags).toEqual([])
      })
    }
    const list = await agent.get(`/api/records/${record.id}/analyses`)
    expect(list.body.map((a: { method: string }) => a.method)).toEqual(['ssi', 'fdd'])
    expect(list.body[0].result.diagram.length).toBeGreaterThan(10)
    expect((await agent.get(`/api/records/${record.id}`)).body.analysisCount).toBe(2)
    // the site's list counts each record's own analyses: a second record has none
    const other = await agent.post(`/api/sites/${site.id}/records`).attach('record', CSV, 'b.csv')
    const records = (await agent.get(`/api/sites/${site.id}/records`)).body
    const counts = records.map((r: { id: number; analysisCount: number }) => [
      r.id,
      r.analysisCount,
    ])
    expect(counts).toEqual([
      [other.body.id, 0],
      [record.id, 2],
    ])
  })

  it('refuses bad analysis options with the field named', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { record } = await setUp(agent)
    const cases = [
      [{ method: 'peaks' }, 'body.method'],
      [{ method: 'ssi', maxOrder: 7 }, 'body.maxOrder'],
      [{ method: 'fdd', minFrequencyHz: 5, maxFrequencyHz: 2 }, 'body.maxFrequencyHz'],
      [{ method: 'fdd', minFrequencyHz: -1 }, 'body.minFrequencyHz'],
    ] as const
    await expectRefusedFields(
      (b) => agent.post(`/api/records/${record.id}/analyses`).send(b),
      cases,
    )
  })

  it('updates the stiffness group to the measured modes and saves a revision with its reason', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { model, record } = await setUp(agent)
    await agent.put(`/api/records/${record.id}/channels`).send(MAPPING(model.id))
    const analysis = await fddAnalysis(agent, record.id)
    const body = {
      baseRevision: 1,
      analysisId: analysis.id,
      groups: [{ kind: 'stiffness', name: 'all springs', springs: [0, 1, 2, 3] }],
    }
    const preview = await agent.post(`/api/models/${model.id}/updates/preview`).send(body)
    expect(preview.status).toBe(200)
    expect(preview.body.model).toBeNull()
    expect(Math.abs(preview.body.update.factors[0].factor / TRUE_SCALE - 1)).toBeLessThan(0.01)
    for (const p of preview.body.update.pairs) {
      expect(p.pairedBy).toBe('mac')
      expect(p.macAfter).toBeGreaterThanOrEqual(0.95)
      expect(Math.abs(p.errorAfter)).toBeLessThan(Math.abs(p.errorBefore))
    }
    expect((await agent.get(`/api/models/${model.id}`)).body.currentRevision).toBe(1)

    const saved = await agent.post(`/api/models/${model.id}/updates`).send(body)
    expect(saved.status).toBe(201)
    expect(saved.body.model.currentRevision).toBe(2)
    const revision = await agent.get(`/api/models/${model.id}/revisions/2`)
    expect(revision.body.reason).toMatch(new RegExp(`record ${record.id}, FDD/EFDD`))
    const k = revision.body.definition.springs[0].stiffness
    expect(k / chainDefinition().springs[0]!.stiffness).toBeCloseTo(
      saved.body.update.factors[0].factor,
      9,
    )
    // a second save from the same base revision is refused: the model moved on
    const stale = await agent
      .post(`/api/models/${model.id}/updates`)
      .send({ ...body, groups: [{ kind: 'mass', nodes: ['m1', 'm2', 'm3'] }] })
    expect(stale.status).toBe(409)
  })

  it('refuses an update naming the field: unmapped channels, unknown spring, missing mode', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { model, record } = await setUp(agent)
    const analysis = await fddAnalysis(agent, record.id)
    const body = {
      baseRevision: 1,
      analysisId: analysis.id,
      groups: [{ kind: 'stiffness', springs: [0] }],
    }
    const unmapped = await agent.post(`/api/models/${model.id}/updates/preview`).send(body)
    expect(unmapped.status).toBe(400)
    expect(unmapped.body.error.details[0].path).toBe('body.analysisId')
    await agent.put(`/api/records/${record.id}/channels`).send(MAPPING(model.id))
    const cases = [
      [{ ...body, groups: [{ kind: 'stiffness', springs: [9] }] }, 'body.groups.0.springs.0'],
      [{ ...body, groups: [{ kind: 'mass', nodes: ['left'] }] }, 'body.groups.0.nodes.0'],
      [{ ...body, modes: [7] }, 'body.modes.0'],
      [{ ...body, groups: [] }, 'body.groups'],
      [{ ...body, baseRevision: 5 }, 'body.baseRevision'],
      [{ ...body, analysisId: 2147483647 }, 'body.analysisId'],
    ] as const
    const preview = `/api/models/${model.id}/updates/preview`
    await expectRefusedFields((b) => agent.post(preview).send(b), cases)
  })

  it('lets only the record’s engineer or an admin change it, and sales only read', async () => {
    const owner = await signedIn(t, 'engineer')
    const { model, record } = await setUp(owner.agent)
    const other = await signedIn(t, 'engineer')
    const sales = await signedIn(t, 'sales')
    const customer = await signedIn(t, 'customer')
    const production = await signedIn(t, 'production')
    const run = { method: 'fdd' }
    expect((await other.agent.post(`/api/records/${record.id}/analyses`).send(run)).status).toBe(
      403,
    )
    expect(
      (await other.agent.put(`/api/records/${record.id}/channels`).send(MAPPING(model.id))).status,
    ).toBe(403)
    expect((await sales.agent.post(`/api/records/${record.id}/analyses`).send(run)).status).toBe(
      403,
    )
    expect((await sales.agent.get(`/api/records/${record.id}/analyses`)).status).toBe(200)
    for (const who of [customer, production]) {
      expect((await who.agent.get(`/api/records/${record.id}/analyses`)).status).toBe(403)
      expect((await who.agent.get(`/api/records/${record.id}/history`)).status).toBe(403)
    }
    const admin = await signedIn(t, 'admin')
    expect((await admin.agent.post(`/api/records/${record.id}/analyses`).send(run)).status).toBe(
      201,
    )
    await owner.agent.put(`/api/records/${record.id}/channels`).send(MAPPING(model.id))
    const analysis = (await owner.agent.get(`/api/records/${record.id}/analyses`)).body[0]
    const update = {
      baseRevision: 1,
      analysisId: analysis.id,
      groups: [{ kind: 'stiffness', springs: [0, 1, 2, 3] }],
    }
    // another engineer may preview but not save on a model that is not theirs
    expect((await other.agent.post(`/api/models/${model.id}/updates`).send(update)).status).toBe(
      403,
    )
    expect(
      (await sales.agent.post(`/api/models/${model.id}/updates/preview`).send(update)).status,
    ).toBe(403)
    expect((await other.agent.get('/api/records/2147483647/analyses')).status).toBe(404)
    expect((await request(t.app).get(`/api/records/${record.id}/analyses`)).status).toBe(401)
  })

  it('deletes a record with its analyses', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { record } = await setUp(agent)
    const analysis = await fddAnalysis(agent, record.id)
    expect((await agent.delete(`/api/records/${record.id}`)).status).toBe(204)
    expect((await agent.get(`/api/records/${record.id}`)).status).toBe(404)
    expect((await agent.get(`/api/records/${record.id}/analyses`)).status).toBe(404)
    const left = await t.ds.query('SELECT COUNT(*) AS n FROM record_analyses WHERE id = ?', [
      analysis.id,
    ])
    expect(Number(left[0].n)).toBe(0)
  })
})
