import { execFile } from 'node:child_process'
import { mkdtemp, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { promisify } from 'node:util'
import { readFileSync } from 'node:fs'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import request, { type Agent } from 'supertest'
import { toModelInput } from '../../shared/sizing/model-input'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { seedCatalogue } from '../../seed/seed-catalogue'
import {
  PASSING_CHOICES,
  buildingDefinition,
  makeCompany,
  siteBody,
  sizingInput,
  siteWithModel,
} from '../helpers/records'

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
  await seedCatalogue(t.services)
})
afterAll(() => t.close())

const siteAndModel = (agent: Agent) => siteWithModel(t, agent)

describe('models', () => {
  it('refuses a model with a floating node, naming the field, and saves nothing', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = (await agent.post('/api/sites').send(siteBody((await makeCompany(t)).id))).body
    const definition = buildingDefinition()
    definition.nodes.push({ id: 'loose', mass: 10 })
    const res = await agent
      .post('/api/models')
      .send({ siteId: site.id, name: 'Broken', definition })
    expect(res.status).toBe(400)
    expect(res.body.error.code).toBe('invalid-model')
    expect(res.body.error.details[0].path).toMatch(/^body\.definition\.nodes/)
    expect((await agent.get('/api/models').query({ siteId: site.id })).body).toEqual([])
  })

  it('makes one revision from two identical saves of the same base', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { model } = await siteAndModel(agent)
    const definition = { ...buildingDefinition(), hostDampingRatio: 0.02 }
    const body = { baseRevision: 1, definition, reason: 'measured damping' }
    const first = await agent.post(`/api/models/${model.id}/revisions`).send(body)
    const second = await agent.post(`/api/models/${model.id}/revisions`).send(body)
    expect(first.body.currentRevision).toBe(2)
    expect(second.body.currentRevision).toBe(2)
    expect(second.body.revisions).toHaveLength(2)
    const stale = await agent
      .post(`/api/models/${model.id}/revisions`)
      .send({ ...body, definition: buildingDefinition() })
    expect(stale.status).toBe(409)
  })
})

describe('model revisions', () => {
  it('serves an older revision with its structure, so a sizing on it can reopen as saved', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { model } = await siteAndModel(agent)
    const stiffer = buildingDefinition()
    stiffer.springs[0]!.stiffness = 300e6
    await agent
      .post(`/api/models/${model.id}/revisions`)
      .send({ baseRevision: 1, definition: stiffer, reason: 'stiffer ground storey' })
    const first = await agent.get(`/api/models/${model.id}/revisions/1`)
    expect(first.status).toBe(200)
    expect(first.body).toMatchObject({ modelId: model.id, revision: 1, reason: 'first version' })
    expect(first.body.definition).toEqual(buildingDefinition())
    const second = await agent.get(`/api/models/${model.id}/revisions/2`)
    expect(second.body.definition.springs[0].stiffness).toBe(300e6)
    expect(second.body.createdByName).not.toBe('')
    // The model itself: the current revision's structure, and every revision listed by reason.
    const now = await agent.get(`/api/models/${model.id}`)
    expect(now.body.definition).toEqual(second.body.definition)
    expect(now.body.revisions).toEqual([
      {
        revision: 1,
        reason: 'first version',
        createdAt: first.body.createdAt,
        createdByName: first.body.createdByName,
      },
      {
        revision: 2,
        reason: 'stiffer ground storey',
        createdAt: second.body.createdAt,
        createdByName: second.body.createdByName,
      },
    ])
  })

  it('lists the models of a site, each with its own current structure and revisions', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model: first } = await siteAndModel(agent)
    const lighter = buildingDefinition()
    lighter.nodes[1]!.mass = 100_000
    const made = await agent
      .post('/api/models')
      .send({ siteId: site.id, name: 'Lighter', definition: lighter })
    expect(made.status, JSON.stringify(made.body)).toBe(201)
    const second = made.body
    const stiffer = buildingDefinition()
    stiffer.springs[0]!.stiffness = 300e6
    await agent
      .post(`/api/models/${first.id}/revisions`)
      .send({ baseRevision: 1, definition: stiffer, reason: 'stiffer ground storey' })
    const body = (await agent.get('/api/models').query({ siteId: site.id })).body
    const listed = [first.id, second.id].map((id) => body.find((m: { id: number }) => m.id === id))
    expect(body).toHaveLength(2)
    expect(listed[0]).toMatchObject({ currentRevision: 2, definition: stiffer })
    expect(listed[0].revisions.map((r: { reason: string }) => r.reason)).toEqual([
      'first version',
      'stiffer ground storey',
    ])
    expect(listed[1]).toMatchObject({ currentRevision: 1, definition: lighter, name: 'Lighter' })
    expect(listed[1].revisions).toHaveLength(1)
    // the list says of each model what the model's own answer says
    for (const m of body) expect((await agent.get(`/api/models/${m.id}`)).body).toEqual(m)
  })

  it('answers 404 for a revision or a model that does not exist, 401 and 403 to others', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { model } = await siteAndModel(agent)
    expect((await agent.get(`/api/models/${model.id}/revisions/7`)).status).toBe(404)
    expect((await agent.get('/api/models/999999/revisions/1')).status).toBe(404)
    expect((await agent.get(`/api/models/${model.id}/revisions/0`)).status).toBe(400)
    expect((await request(t.app).get(`/api/models/${model.id}/revisions/1`)).status).toBe(401)
    const { agent: customer } = await signedIn(t, 'customer')
    expect((await customer.get(`/api/models/${model.id}/revisions/1`)).status).toBe(403)
  })
})

describe('answers that depend on the user', () => {
  it('tells the browser never to keep an API answer, signed in or not', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const me = await agent.get('/api/auth/me')
    expect(me.status).toBe(200)
    expect(me.headers['cache-control']).toBe('no-store')
    const anonymous = await request(t.app).get('/api/auth/me')
    expect(anonymous.status).toBe(401)
    expect(anonymous.headers['cache-control']).toBe('no-store')
    expect((await agent.get('/api/nothing-here')).headers['cache-control']).toBe('no-store')
  })
})

describe('sizings', () => {
  it('reopens every input exactly as saved: given tuning, band, tolerance and linked records', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const record = await agent
      .post(`/api/sites/${site.id}/records`)
      .attach('record', readFileSync('seed/records/heel-drop-office-floor.csv'), 'heel.csv')
    expect(record.status).toBe(201)
    const input = sizingInput(site.id, model.id, {
      tuning: { frequencyRatio: 0.95, dampingRatio: 0.08 },
      band: { minHz: 0.5, maxHz: 2 },
      detuningTolerance: 0.07,
      records: [
        { recordId: record.body.id, peaks: [{ mode: 1, frequencyHz: 1.02, dampingRatio: null }] },
      ],
    })
    const saved = await agent.post('/api/sizings').send({ input })
    expect(saved.status).toBe(201)
    const reopened = (await agent.get(`/api/sizings/${saved.body.id}`)).body
    expect(reopened.input).toEqual(input)
    // the given tuning is the one solved: f = ω_a/ω_target and ζ_a as entered
    expect(reopened.evaluation.result.absorber.frequencyRatio).toBeCloseTo(0.95, 12)
    expect(reopened.evaluation.result.absorber.dampingRatio).toBeCloseTo(0.08, 12)
    expect(reopened.evaluation.result.band).toMatchObject({ minHz: 0.5, maxHz: 2, source: 'user' })
  })

  it('refuses a linked record of another site, naming the field', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const { site: other } = await siteAndModel(agent)
    const record = await agent
      .post(`/api/sites/${other.id}/records`)
      .attach('record', readFileSync('seed/records/heel-drop-office-floor.csv'), 'heel.csv')
    const input = sizingInput(site.id, model.id, {
      records: [{ recordId: record.body.id, peaks: [] }],
    })
    const res = await agent.post('/api/sizings').send({ input })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0]).toEqual({
      path: 'body.input.records.0.recordId',
      message: 'not a record of this site',
    })
  })

  it('solves on the server and stores the result with the reduction and the checks', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const res = await agent.post('/api/sizings').send({ input: sizingInput(site.id, model.id) })
    expect(res.status).toBe(201)
    expect(res.body.revision).toBe(1)
    expect(res.body.state).toBe('draft')
    const r = res.body.evaluation.result
    expect(r.modes).toHaveLength(5)
    expect(r.absorber.mass).toBeCloseTo(0.02 * r.effectiveMass, 6)
    expect(r.peak.reductionFactor).toBeGreaterThan(2)
    expect(res.body.summary.acceptance).toMatchObject({ quantity: 'acceleration', limit: 0.15 })
    expect(res.body.evaluation.sweep.length).toBeGreaterThan(3)
    expect(res.body.evaluation.robustness.curve.length).toBe(21)
  })

  it('stores the same result as the solve command line for the same model', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const input = sizingInput(site.id, model.id, { tuning: 'den-hartog' })
    const saved = (await agent.post('/api/sizings').send({ input })).body
    const dir = await mkdtemp(path.join(tmpdir(), 'qn-'))
    const file = path.join(dir, 'model.json')
    await writeFile(file, JSON.stringify(toModelInput(buildingDefinition(), saved.input)))
    const { stdout } = await promisify(execFile)('npx', ['tsx', 'server/scripts/solve.ts', file], {
      cwd: process.cwd(),
    })
    expect(JSON.parse(stdout)).toEqual(JSON.parse(JSON.stringify(saved.evaluation.result)))
  })

  it('refuses a sizing whose absorber node does not exist, naming the field, and saves nothing', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const res = await agent
      .post('/api/sizings')
      .send({ input: sizingInput(site.id, model.id, { absorberNode: 'attic' }) })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0].path).toBe('body.input.absorberNode')
    expect((await agent.get('/api/sizings').query({ siteId: site.id })).body).toEqual([])
  })

  it('accepts and stores base excitation between storeys with a stroke limit, and shows the load in the summary', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const input = sizingInput(site.id, model.id, {
      loadKind: 'base',
      baseAcceleration: 0.4,
      relativeToNode: 'storey-4',
      strokeLimit: 0.3,
    })
    const res = await agent.post('/api/sizings').send({ input })
    expect(res.status).toBe(201)
    const r = res.body.evaluation.result
    expect(r.excitation).toMatchObject({ kind: 'base', amplitude: 0.4, unit: 'm/s²' })
    expect(r.absorber).toMatchObject({ node: 'storey-5', relativeTo: 'storey-4', strokeLimit: 0.3 })
    expect(res.body.evaluation.checks).toMatchObject({ forceAmplitude: 0.4, loadUnit: 'm/s²' })
    expect(res.body.summary).toMatchObject({
      load: 'Support (base) acceleration 0.4 m/s²',
      strokeLimit: 0.3,
    })
    const back = await agent.get(`/api/sizings/${res.body.id}`)
    expect(back.body.input).toMatchObject({
      loadKind: 'base',
      baseAcceleration: 0.4,
      relativeToNode: 'storey-4',
      strokeLimit: 0.3,
    })
  })

  it('refuses a field of another load kind and an engine error on a new field, naming each', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const wrongKind = await agent.post('/api/sizings').send({
      input: sizingInput(site.id, model.id, {
        unbalance: 0.1,
        loadKind: 'base',
        baseAcceleration: 1,
      }),
    })
    expect(wrongKind.status).toBe(400)
    expect(wrongKind.body.error.details[0]).toEqual({
      path: 'body.input.unbalance',
      message: "only for loadKind 'force'",
    })
    const sameNode = await agent
      .post('/api/sizings')
      .send({ input: sizingInput(site.id, model.id, { relativeToNode: 'storey-5' }) })
    expect(sameNode.status).toBe(400)
    expect(sameNode.body.error.details[0].path).toBe('body.input.relativeToNode')
  })

  // Common practice: a misspelt option is refused instead of silently running with a default.
  it('refuses a sizing input with a misspelt key, naming it and the likely key, and saves nothing', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const input = { ...sizingInput(site.id, model.id), massRatios: 0.05 }
    const res = await agent.post('/api/sizings').send({ input })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0]).toEqual({
      path: 'body.input',
      message: "unknown key 'massRatios' — did you mean 'massRatio'?",
    })
    expect((await agent.get('/api/sizings').query({ siteId: site.id })).body).toEqual([])
  })

  it('refuses a model node with a misspelt key, naming it', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = (await agent.post('/api/sites').send(siteBody((await makeCompany(t)).id))).body
    const definition = buildingDefinition()
    const nodes = definition.nodes.map((n, i) => (i === 1 ? { ...n, fixd: true } : n))
    const res = await agent
      .post('/api/models')
      .send({ siteId: site.id, name: 'Typo', definition: { ...definition, nodes } })
    expect(res.status).toBe(400)
    expect(res.body.error.details[0]).toEqual({
      path: 'body.definition.nodes.1',
      message: "unknown key 'fixd' — did you mean 'fixed'?",
    })
  })

  it('does not let an engineer change another engineer’s sizing', async () => {
    const { agent: owner } = await signedIn(t, 'engineer')
    const { agent: other } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(owner)
    const s = (await owner.post('/api/sizings').send({ input: sizingInput(site.id, model.id) }))
      .body
    const res = await other
      .put(`/api/sizings/${s.id}`)
      .send({ baseRevision: 1, input: sizingInput(site.id, model.id, { massRatio: 0.05 }) })
    expect([403, 404]).toContain(res.status)
    expect((await owner.get(`/api/sizings/${s.id}`)).body.revision).toBe(1)
  })

  it('keeps sizings from customers and production', async () => {
    for (const role of ['customer', 'production'] as const) {
      const { agent } = await signedIn(t, role)
      expect((await agent.get('/api/sizings')).status).toBe(403)
    }
  })

  it('makes one revision from two saves of the same base revision', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteAndModel(agent)
    const s = (await agent.post('/api/sizings').send({ input: sizingInput(site.id, model.id) }))
      .body
    const body = { baseRevision: 1, input: sizingInput(site.id, model.id, { massRatio: 0.03 }) }
    const [a, b] = await Promise.all([
      agent.put(`/api/sizings/${s.id}`).send(body),
      agent.put(`/api/sizings/${s.id}`).send(body),
    ])
    expect(a.status).toBe(200)
    expect(b.status).toBe(200)
    expect(a.body.revision).toBe(2)
    expect(b.body.revision).toBe(2)
    const list = (await agent.get('/api/sizings').query({ siteId: site.id })).body
    expect(list[0].revision).toBe(2)
  })

  it('hands a sizing to sales, who then sees it, and makes it read-only until reopened', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { agent: sales } = await signedIn(t, 'sales')
    const { site, model } = await siteAndModel(agent)
    const s = (
      await agent
        .post('/api/sizings')
        .send({ input: sizingInput(site.id, model.id, PASSING_CHOICES) })
    ).body
    expect(s.designChecks.map((c: { passes: boolean }) => c.passes)).toEqual([true, true, true])
    expect((await sales.get(`/api/sizings/${s.id}`)).status).toBe(404)
    const sub = await agent
      .post(`/api/sizings/${s.id}/submit`)
      .send({ revision: 1, note: 'Roof unit, access by the plant room' })
    expect(sub.body.state).toBe('submitted')
    expect(sub.body.acknowledgement).toBeNull()
    const seen = await sales.get(`/api/sizings/${s.id}`)
    expect(seen.status).toBe(200)
    expect(seen.body.handoverNote).toBe('Roof unit, access by the plant room')
    const edit = await agent
      .put(`/api/sizings/${s.id}`)
      .send({ baseRevision: 1, input: sizingInput(site.id, model.id, { massRatio: 0.04 }) })
    expect(edit.status).toBe(409)
    expect(
      (
        await sales
          .put(`/api/sizings/${s.id}`)
          .send({ baseRevision: 1, input: sizingInput(site.id, model.id) })
      ).status,
    ).toBe(403)
    expect((await agent.post(`/api/sizings/${s.id}/reopen`)).body.state).toBe('draft')
  })
})
