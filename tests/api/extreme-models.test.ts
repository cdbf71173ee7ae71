import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Agent } from 'supertest'
import { ENGINE_RANGES } from '../../shared/schemas/model'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { buildingDefinition, makeCompany, siteBody, sizingInput } from '../helpers/records'

let t: TestApp
let engineer: Agent
let siteId: number
beforeAll(async () => {
  t = await makeTestApp()
  engineer = (await signedIn(t, 'engineer')).agent
  siteId = (await engineer.post('/api/sites').send(siteBody((await makeCompany(t)).id))).body.id
})
afterAll(() => t.close())

const createModel = (definition: unknown) =>
  engineer.post('/api/models').send({ siteId, name: 'Extreme', definition })

/** A two-mass chain on one support, with the given masses and stiffnesses. */
const chain = (m1: number, m2: number, k1: number, k2: number) => ({
  nodes: [
    { id: 'ground', fixed: true },
    { id: 'a', mass: m1 },
    { id: 'b', mass: m2 },
  ],
  springs: [
    { from: 'ground', to: 'a', stiffness: k1 },
    { from: 'a', to: 'b', stiffness: k2 },
  ],
  hostDampingRatio: 0.02,
})

describe('models at the edge of the engine’s range', () => {
  it('refuses values outside the documented ranges with 422 naming the field', async () => {
    const cases: [unknown, string][] = [
      [chain(1e308, 10, 1e6, 1e6), 'body.definition.nodes.1.mass'],
      [chain(5e-324, 10, 1e6, 1e6), 'body.definition.nodes.1.mass'],
      [chain(10, 10, 1e300, 1e6), 'body.definition.springs.0.stiffness'],
      [chain(10, 10, 1e6, 5e-324), 'body.definition.springs.1.stiffness'],
    ]
    for (const [definition, path] of cases) {
      const res = await createModel(definition)
      expect(res.status).toBe(422)
      expect(res.body.error.code).toBe('out-of-range')
      expect(res.body.error.details[0].path).toBe(path)
    }
    // a JSON number too large for a double arrives as Infinity: a malformed body, 400
    const huge = await engineer
      .post('/api/models')
      .set('content-type', 'application/json')
      .send(
        `{"siteId":${siteId},"name":"x","definition":{"nodes":[{"id":"a","mass":1e400}],"springs":[]}}`,
      )
    expect(huge.status).toBe(400)
  })

  it('accepts the ends of the ranges', async () => {
    const { mass, stiffness } = ENGINE_RANGES
    const res = await createModel(chain(mass.max / 10, mass.max, stiffness.max, stiffness.max))
    expect(res.status).toBe(201)
  })

  it('refuses an ill-conditioned model within the ranges with 422 naming the node', async () => {
    // 1 µg on a 1e12 N/m spring beside a 1e9 kg mass: stiffness-to-mass ratios 1e18 apart
    const res = await createModel(chain(1e9, 1e-6, 1e3, 1e6))
    expect(res.status).toBe(422)
    expect(res.body.error.code).toBe('ill-conditioned-model')
    expect(res.body.error.details[0].path).toMatch(/^body\.definition\.nodes\.[12]\.mass$/)
  })

  it("refuses to size a stored model that fails today's checks, with 422 naming the node", async () => {
    // A model stored before the conditioning check existed: its revision is rewritten in the
    // table, as an older version of the server could have stored it.
    const model = (await createModel(buildingDefinition())).body
    await t.ds.query('UPDATE model_revisions SET definition = ? WHERE modelId = ?', [
      JSON.stringify(chain(1e9, 1e-6, 1e3, 1e6)),
      model.id,
    ])
    const input = sizingInput(siteId, model.id, {
      absorberNode: 'b',
      excitationNode: 'b',
      responseNode: 'b',
    })
    const res = await engineer.post('/api/sizings').send({ input })
    expect(res.status).toBe(422)
    expect(res.body.error.code).toBe('ill-conditioned-model')
    expect(res.body.error.details[0].path).toMatch(/^model\.nodes\.[12]\.mass$/)
    const list = await engineer.get('/api/sizings')
    expect(list.body.filter((s: { siteId: number }) => s.siteId === siteId)).toEqual([])
  })

  it('refuses a sizing band of 1e-300 Hz and an absurd tuning with 422 before any solve', async () => {
    const model = (await createModel(buildingDefinition())).body
    const band = await engineer.post('/api/sizings').send({
      input: sizingInput(siteId, model.id, { band: { minHz: 1e-300, maxHz: 2e-300 } }),
    })
    expect(band.status).toBe(422)
    expect(band.body.error.details[0].path).toBe('body.input.band.minHz')
    const narrow = await engineer.post('/api/sizings').send({
      input: sizingInput(siteId, model.id, { band: { minHz: 2, maxHz: 2 + 1e-12 } }),
    })
    expect(narrow.status).toBe(422)
    expect(narrow.body.error.details[0].path).toBe('body.input.band.maxHz')
    const tuning = await engineer.post('/api/sizings').send({
      input: sizingInput(siteId, model.id, {
        tuning: { frequencyRatio: 1e200, dampingRatio: 0.1 },
      }),
    })
    expect(tuning.status).toBe(422)
    expect(tuning.body.error.details[0].path).toBe('body.input.tuning.frequencyRatio')
    const force = await engineer.post('/api/sizings').send({
      input: sizingInput(siteId, model.id, { forceAmplitude: 1e308 }),
    })
    expect(force.status).toBe(400)
  })
})
