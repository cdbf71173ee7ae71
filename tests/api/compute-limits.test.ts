import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import request from 'supertest'
import { createSizingPool, type SizingPool } from '../../server/workers/pool'
import { anotherInstance, makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { makeCompany, siteBody, sizingInput, siteWithModel } from '../helpers/records'

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
})
afterAll(() => t.close())

/** A chain of n storeys between the ground and a roof: big enough that a study takes a while. */
function chain(n: number) {
  const nodes: { id: string; fixed?: boolean; mass?: number }[] = [{ id: 'ground', fixed: true }]
  const springs: { from: string; to: string; stiffness: number }[] = []
  for (let i = 1; i <= n; i++) {
    nodes.push({ id: `storey-${i}`, mass: 2000 + (i % 7) * 100 })
    springs.push({
      from: i === 1 ? 'ground' : `storey-${i - 1}`,
      to: `storey-${i}`,
      stiffness: 5e8,
    })
  }
  return { nodes, springs, hostDampingRatio: 0.01 }
}

async function chainOnSite(agent: request.Agent, n: number) {
  const made = { name: `Chain of ${n}`, definition: chain(n) }
  const { site, model } = await siteWithModel(t, agent, made, {})
  const input = sizingInput(site.id, model.id, {
    absorberNode: `storey-${n}`,
    excitationNode: `storey-${n}`,
    responseNode: `storey-${n}`,
  })
  return { site, model, input }
}

/** An app instance on the same database whose engine pool has the given limits. */
async function appWithPool(pool: SizingPool) {
  const other = await anotherInstance(t, { pool })
  return {
    ...other,
    close: async () => {
      await other.close()
      await pool.close()
    },
  }
}

describe('bounded compute', () => {
  it('refuses a model over the documented size limit with 422, naming the field, and saves nothing', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = (await agent.post('/api/sites').send(siteBody((await makeCompany(t)).id))).body
    const res = await agent
      .post('/api/models')
      .send({ siteId: site.id, name: 'Too fine', definition: chain(1000) })
    expect(res.status).toBe(422)
    expect(res.body.error.code).toBe('out-of-range')
    expect(res.body.error.details[0].path).toBe('body.definition.nodes')
    expect(res.body.error.message).toMatch(/at most 1000 nodes/)
    expect((await agent.get('/api/models').query({ siteId: site.id })).body).toEqual([])
  })

  it('stops a sizing that runs past its time budget with 422 and stores no sizing', async () => {
    const { agent, cookie } = await signedIn(t, 'engineer')
    const { input, site } = await chainOnSite(agent, 300)
    const other = await appWithPool(createSizingPool(1, { budgetMs: 20 }))
    try {
      const res = await request(other.app)
        .post('/api/sizings')
        .set('cookie', cookie)
        .send({ input })
      expect(res.status).toBe(422)
      expect(res.body.error.code).toBe('compute-budget')
      expect(res.body.error.message).toMatch(/budget/)
      const list = await agent.get('/api/sizings').query({ siteId: site.id })
      expect(list.body).toEqual([])
    } finally {
      await other.close()
    }
  }, 60_000)

  it('answers 503 with Retry-After when the engine queue is full, and solves the others', async () => {
    const { agent, cookie } = await signedIn(t, 'engineer')
    const { input } = await chainOnSite(agent, 300)
    const other = await appWithPool(createSizingPool(1, { maxQueue: 1 }))
    try {
      const answers = await Promise.all(
        Array.from({ length: 5 }, (_, i) =>
          request(other.app)
            .post('/api/sizings')
            .set('cookie', cookie)
            .send({ input: { ...input, title: `Queued ${i}` } }),
        ),
      )
      const busy = answers.filter((r) => r.status === 503)
      expect(busy.length).toBeGreaterThan(0)
      expect(answers.filter((r) => r.status === 201).length).toBeGreaterThan(0)
      expect(busy[0]?.body.error.code).toBe('engine-busy')
      expect(Number(busy[0]?.headers['retry-after'])).toBeGreaterThan(0)
    } finally {
      await other.close()
    }
  }, 120_000)

  it('cancels the sizing of a request the client closed, and stores nothing', async () => {
    const { agent, cookie } = await signedIn(t, 'engineer')
    const { input, site } = await chainOnSite(agent, 600)
    const real = createSizingPool(1)
    const outcomes: string[] = []
    const spy: SizingPool = {
      ...real,
      run: (job, options) =>
        real.run(job, options).then(
          (r) => (outcomes.push('solved'), r),
          (e: { code?: string }) => {
            outcomes.push(e.code ?? 'error')
            throw e
          },
        ),
    }
    const other = await appWithPool(spy)
    try {
      const pending = request(other.app).post('/api/sizings').set('cookie', cookie).send({ input })
      pending.then(
        () => undefined,
        () => undefined,
      )
      await new Promise((r) => setTimeout(r, 300))
      pending.abort()
      for (let i = 0; i < 600 && outcomes.length === 0; i++)
        await new Promise((r) => setTimeout(r, 100))
      expect(outcomes).toEqual(['cancelled'])
      const list = await agent.get('/api/sizings').query({ siteId: site.id })
      expect(list.body).toEqual([])
    } finally {
      await other.close()
    }
  }, 120_000)
})
