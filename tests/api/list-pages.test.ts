import { randomBytes } from 'node:crypto'
import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { makeCompany, siteBody, sizingInput, siteWithModel, TINY_PNG } from '../helpers/records'

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
})
afterAll(() => t.close())

const ids = (body: { id: number }[]) => body.map((r) => r.id)

describe('paged lists of sites, sizings and customers', () => {
  it('pages the sites last changed first, with the total in X-Total-Count and a narrow row', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const company = await makeCompany(t)
    const made: number[] = []
    for (let i = 0; i < 3; i++)
      made.push((await agent.post('/api/sites').send(siteBody(company.id))).body.id)
    await agent.post(`/api/sites/${made[0]}/photos`).attach('photo', TINY_PNG, 'p.png').expect(201)
    const newest = [...made].reverse()
    const first = await agent.get('/api/sites').query({ companyId: company.id, limit: 2 })
    expect(first.status).toBe(200)
    expect(first.headers['x-total-count']).toBe('3')
    expect(ids(first.body)).toEqual(newest.slice(0, 2))
    const rest = await agent.get('/api/sites').query({ companyId: company.id, limit: 2, offset: 2 })
    expect(rest.headers['x-total-count']).toBe('3')
    expect(ids(rest.body)).toEqual(newest.slice(2))
    const whole = await agent.get('/api/sites').query({ companyId: company.id })
    const row = whole.body.find((s: { id: number }) => s.id === made[0])
    expect(row).toMatchObject({ photoCount: 1, companyName: company.name, structureKind: 'floor' })
    expect(row).not.toHaveProperty('notes')
    expect(row).not.toHaveProperty('photos')
    const bad = await agent.get('/api/sites').query({ limit: 0 })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('query.limit')
  })

  it('pages the sizings an engineer may see and filters them on the server', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const { site, model } = await siteWithModel(t, agent)
    const titles = ['North bay', 'South bay', 'North gallery']
    for (const title of titles)
      await agent
        .post('/api/sizings')
        .send({ input: { ...sizingInput(site.id, model.id), title } })
        .expect(201)
    const page = await agent.get('/api/sizings').query({ siteId: site.id, limit: 2 })
    expect(page.headers['x-total-count']).toBe('3')
    expect(page.body).toHaveLength(2)
    const north = await agent.get('/api/sizings').query({ siteId: site.id, search: 'North' })
    expect(north.headers['x-total-count']).toBe('2')
    expect(north.body.map((s: { title: string }) => s.title).sort()).toEqual([
      'North bay',
      'North gallery',
    ])
    const row = north.body[0]
    expect(row.absorberMass).toBeGreaterThan(0)
    expect(row.hostFrequencyHz).toBeGreaterThan(0)
    expect(typeof row.passes).toBe('boolean')
    // The list's figures are those the sizing itself shows.
    const full = (await agent.get(`/api/sizings/${row.id}`)).body
    expect(row.absorberMass).toBeCloseTo(full.evaluation.result.absorber.mass, 9)
    expect(row.passes).toBe(full.evaluation.checks.passes)
  })

  it('pages the customers by name, searches them on the server and keeps their contacts', async () => {
    const { agent } = await signedIn(t, 'sales')
    const tag = randomBytes(4).toString('hex')
    const names = ['Cedar', 'Alder', 'Birch'].map((n) => `${n} Holdings ${tag}`)
    for (const name of names) await agent.post('/api/customers').send({ name }).expect(201)
    const alder = (await agent.get('/api/customers').query({ search: `Alder Holdings ${tag}` }))
      .body[0]
    await agent
      .post(`/api/customers/${alder.id}/contacts`)
      .send({ name: 'Ana Park', email: `ana.${tag}@example.test` })
      .expect(201)
    const first = await agent.get('/api/customers').query({ search: tag, limit: 2 })
    expect(first.headers['x-total-count']).toBe('3')
    expect(first.body.map((c: { name: string }) => c.name)).toEqual([...names].sort().slice(0, 2))
    expect(first.body[0].contacts.map((c: { name: string }) => c.name)).toEqual(['Ana Park'])
    const rest = await agent.get('/api/customers').query({ search: tag, limit: 2, offset: 2 })
    expect(rest.body.map((c: { name: string }) => c.name)).toEqual([[...names].sort()[2]])
    const bad = await agent.get('/api/customers').query({ offset: '-1' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('query.offset')
  })
})
