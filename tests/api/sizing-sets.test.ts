import { execFile } from 'node:child_process'
import { mkdtemp, writeFile } from 'node:fs/promises'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { promisify } from 'node:util'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import type { Agent } from 'supertest'
import { EigenvalueDecomposition, Matrix } from 'ml-matrix'
import { toSetModelInput } from '../../shared/sizing/model-input'
import { seedCatalogue } from '../../seed/seed-catalogue'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { PASSING_CHOICES, buildingDefinition, sizingInput, siteWithModel } from '../helpers/records'

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
  await seedCatalogue(t.services)
})
afterAll(() => t.close())

/** Effective mass of the building's mode r (0-based) at the roof, from ml-matrix: with equal
 * storey masses m the modes of K/m are those of the building, and φ = v/√m. */
function roofEffectiveMass(r: number) {
  const def = buildingDefinition()
  const m = 200_000
  const k = 250e6 / m
  const n = 5
  const a = Matrix.zeros(n, n)
  for (let i = 0; i < n; i++) {
    a.set(i, i, i < n - 1 ? 2 * k : k)
    if (i > 0) a.set(i, i - 1, -k).set(i - 1, i, -k)
  }
  expect(def.nodes.filter((x) => x.mass === m)).toHaveLength(n)
  const e = new EigenvalueDecomposition(a, { assumeSymmetric: true })
  const order = e.realEigenvalues.map((v, i) => [v, i] as const).sort((x, y) => x[0] - y[0])
  const v = e.eigenvectorMatrix.get(n - 1, order[r]![1])
  return m / (v * v)
}

/** The building's roof absorber for mode 1 and a second one for mode 2, given by its mass. */
const SECOND = { node: 'storey-5', targetMode: 2, mass: 12_000 }

async function saved(agent: Agent, overrides: Record<string, unknown> = {}) {
  const { site, model } = await siteWithModel(t, agent)
  const input = sizingInput(site.id, model.id, { absorbers: [SECOND], ...overrides })
  const res = await agent.post('/api/sizings').send({ input })
  return { res, input, site, model }
}

describe('a sizing with several absorbers', () => {
  it('sizes every unit with the whole set in place and states the set against each target mode', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { res, site } = await saved(agent)
    expect(res.status).toBe(201)
    const s = res.body.summary
    expect(s.absorbers).toHaveLength(2)
    const [first, second] = s.absorbers
    expect(first).toMatchObject({ node: 'storey-5', targetMode: 1, massRatio: 0.02 })
    expect(second).toMatchObject({ node: 'storey-5', targetMode: 2, mass: 12_000 })
    // Effective mass of mode r at node j is 1/φ_{j,r}² for mass-normalised φ
    // (docs/engineering/host-model.md#effective-mass); the modes from ml-matrix's symmetric solver.
    expect(second.effectiveMass / roofEffectiveMass(1)).toBeCloseTo(1, 9)
    expect(first.effectiveMass / roofEffectiveMass(0)).toBeCloseTo(1, 9)
    expect(second.massRatio).toBeCloseTo(12_000 / second.effectiveMass, 9)
    expect(first.mass).toBeCloseTo(0.02 * first.effectiveMass, 6)
    expect(s.absorber.mass).toBeCloseTo(first.mass, 9)
    expect(s.totalMass).toBeCloseTo(first.mass + 12_000, 6)
    expect(s.massRatios).toEqual([
      { mode: 1, mass: first.mass, effectiveMass: first.effectiveMass, massRatio: 0.02 },
      expect.objectContaining({ mode: 2, mass: 12_000 }),
    ])
    // Each unit's spring rate and damper follow from its frequency and damping ratio:
    // k = m ω_a², c = 2 ζ m ω_a (definitions, docs/engineering/tuning.md#absorber-values).
    for (const u of s.absorbers) {
      const w = 2 * Math.PI * u.frequencyHz
      expect(u.stiffness).toBeCloseTo(u.mass * w * w, 3)
      expect(u.damping / (2 * u.mass * w)).toBeCloseTo(u.dampingRatio, 9)
      expect(u.stroke).toBeGreaterThan(0)
    }
    expect(s.stroke).toBe(Math.max(first.stroke, second.stroke))
    // the sizings list shows the mass of the whole set
    const [row] = (await agent.get('/api/sizings').query({ siteId: site.id })).body
    expect(row.absorberMass).toBe(s.totalMass)
  })

  it('reports the peak with the whole set as the largest response over both target bands', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { res } = await saved(agent)
    const ev = res.body.evaluation
    expect(ev.set.targets.map((x: { mode: number }) => x.mode)).toEqual([1, 2])
    for (const target of ev.set.targets) expect(target.reduction).toBeGreaterThan(0.5)
    // The chart's curve is a dense evaluation of the same response: the reported peak is its
    // maximum or above, and close to it (300 log-spaced points; common practice 1 %).
    const curve: number[] = ev.response.with.accelerance
    const densest = Math.max(...curve) * 5000
    expect(ev.checks.responseWith).toBeGreaterThanOrEqual(densest * (1 - 1e-9))
    expect(ev.checks.responseWith).toBeLessThan(densest * 1.01)
    expect(res.body.summary.acceptance.responseWith).toBe(ev.checks.responseWith)
    expect(res.body.summary.reduction).toBeCloseTo(ev.set.peak.without / ev.set.peak.with, 9)
    // Mode 2 is in the chart's range, and so is its peak without the set.
    const hz: number[] = ev.response.frequencyHz
    expect(hz[hz.length - 1]).toBeGreaterThan(ev.set.targets[1].frequencyHz)
  })

  it('stores the same set as the solve command line for the same model', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { res } = await saved(agent)
    const dir = await mkdtemp(path.join(tmpdir(), 'qn-set-'))
    const file = path.join(dir, 'model.json')
    await writeFile(file, JSON.stringify(toSetModelInput(buildingDefinition(), res.body.input)))
    const { stdout } = await promisify(execFile)('npx', ['tsx', 'server/scripts/solve.ts', file], {
      cwd: process.cwd(),
    })
    const cli = JSON.parse(stdout)
    expect(cli.absorbers).toEqual(res.body.evaluation.set.absorbers)
    expect(cli.peak).toEqual(res.body.evaluation.set.peak)
  }, 60_000)

  it('reopens the units exactly as typed, and an older revision keeps its own', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { res, input } = await saved(agent)
    const id = res.body.id
    expect((await agent.get(`/api/sizings/${id}`)).body.input.absorbers).toEqual([SECOND])
    const third = { node: 'storey-4', targetMode: 2, massRatio: 0.01, tuning: 'den-hartog' }
    const next = await agent
      .put(`/api/sizings/${id}`)
      .send({ baseRevision: 1, input: { ...input, absorbers: [SECOND, third] } })
    expect(next.status).toBe(200)
    expect(next.body.input.absorbers).toEqual([SECOND, third])
    expect(next.body.summary.absorbers).toHaveLength(3)
    const first = await agent.get(`/api/sizings/${id}`).query({ revision: 1 })
    expect(first.body.input.absorbers).toEqual([SECOND])
  })

  it('keeps a sizing without further units exactly as before', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteWithModel(t, agent)
    const res = await agent.post('/api/sizings').send({ input: sizingInput(site.id, model.id) })
    expect(res.status).toBe(201)
    expect(res.body.summary.absorbers).toBeUndefined()
    expect(res.body.evaluation.set).toBeUndefined()
    expect(res.body.evaluation.sweep.length).toBeGreaterThan(3)
  })

  it('refuses a unit with both a mass and a mass ratio, or too many units, naming the field', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const both = await saved(agent, { absorbers: [{ ...SECOND, massRatio: 0.01 }] })
    expect(both.res.status).toBe(400)
    expect(both.res.body.error.details[0].path).toBe('body.input.absorbers.0.massRatio')
    const many = await saved(agent, { absorbers: Array.from({ length: 12 }, () => SECOND) })
    expect(many.res.status).toBe(400)
    expect(many.res.body.error.details[0].path).toBe('body.input.absorbers')
    expect(many.res.body.error.details[0].message).toMatch(/at most 12 absorbers/)
  })

  it('refuses a unit on an unknown node or a mode the model lacks, naming that unit, and saves nothing', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const attic = await saved(agent, { absorbers: [SECOND, { ...SECOND, node: 'attic' }] })
    expect(attic.res.status).toBe(400)
    expect(attic.res.body.error.details[0].path).toBe('body.input.absorbers.1.node')
    const mode9 = await saved(agent, { absorbers: [{ ...SECOND, targetMode: 9 }] })
    expect(mode9.res.status).toBe(400)
    expect(mode9.res.body.error.details[0].path).toBe('body.input.absorbers.0.targetMode')
    const list = await agent.get('/api/sizings').query({ siteId: mode9.site.id })
    expect(list.body).toEqual([])
  })

  it('judges the design checks on the worst unit: a small, lightly damped unit fails the stroke', async () => {
    const { agent } = await signedIn(t, 'engineer')
    // 50 kg at mode 1 with 0.2 % damping moves about 0.14 m, past the 0.08 m travel of the
    // demo catalogue's horizontal line (invented demo data).
    const loose = {
      ...SECOND,
      targetMode: 1,
      mass: 50,
      tuning: { frequencyRatio: 1, dampingRatio: 0.002 },
    }
    const { res } = await saved(agent, { ...PASSING_CHOICES, absorbers: [loose] })
    expect(res.status).toBe(201)
    const checks = (await agent.get(`/api/sizings/${res.body.id}`)).body.designChecks
    const stroke = checks.find((c: { check: string }) => c.check === 'stroke')
    expect(res.body.summary.stroke).toBe(res.body.summary.absorbers[1].stroke)
    expect(stroke.passes).toBe(false)
    const catalogue = checks.find((c: { check: string }) => c.check === 'catalogue')
    expect(catalogue.passes).toBe(false)
    expect(catalogue.message).toMatch(/^No catalogue unit can carry absorber 2 \(50 kg/)
  })
})
