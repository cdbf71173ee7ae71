import { afterAll, beforeAll, describe, expect, it } from 'vitest'
import request from 'supertest'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import { makeCompany, siteBody, TINY_PNG } from '../helpers/records'

let t: TestApp
beforeAll(async () => {
  t = await makeTestApp()
})
afterAll(() => t.close())

describe('sites', () => {
  it('lets an engineer create a site and find it by search and structure kind', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const company = await makeCompany(t)
    const created = await agent
      .post('/api/sites')
      .send(
        siteBody(company.id, { name: 'Gallery footbridge span 2', structureKind: 'footbridge' }),
      )
    expect(created.status).toBe(201)
    expect(created.body).toMatchObject({
      name: 'Gallery footbridge span 2',
      companyName: company.name,
    })
    const found = await agent
      .get('/api/sites')
      .query({ search: 'Gallery foot', structureKind: 'footbridge' })
    expect(found.body.map((s: { id: number }) => s.id)).toContain(created.body.id)
    const none = await agent
      .get('/api/sites')
      .query({ search: 'Gallery foot', structureKind: 'pipework' })
    expect(none.body).toEqual([])
  })

  it('refuses a site without a name, naming the field, and stores nothing', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const company = await makeCompany(t)
    const res = await agent.post('/api/sites').send(siteBody(company.id, { name: '' }))
    expect(res.status).toBe(400)
    expect(res.body.error.details[0].path).toBe('body.name')
    expect((await agent.get('/api/sites').query({ companyId: company.id })).body).toEqual([])
  })

  it('lets only the engineer who made a site change it', async () => {
    const { agent: owner } = await signedIn(t, 'engineer')
    const { agent: other } = await signedIn(t, 'engineer')
    const company = await makeCompany(t)
    const site = (await owner.post('/api/sites').send(siteBody(company.id))).body
    const res = await other
      .put(`/api/sites/${site.id}`)
      .send(siteBody(company.id, { name: 'Taken over' }))
    expect(res.status).toBe(403)
    const ok = await owner
      .put(`/api/sites/${site.id}`)
      .send(siteBody(company.id, { name: 'Renamed floor' }))
    expect(ok.body.name).toBe('Renamed floor')
  })

  it('keeps sites from customers and production', async () => {
    for (const role of ['customer', 'production'] as const) {
      const { agent } = await signedIn(t, role)
      expect((await agent.get('/api/sites')).status).toBe(403)
    }
    expect((await request(t.app).get('/api/sites')).status).toBe(401)
  })

  it('answers an unknown site with 404 and a bad id with 400', async () => {
    const { agent } = await signedIn(t, 'sales')
    expect((await agent.get('/api/sites/999999')).status).toBe(404)
    const bad = await agent.get('/api/sites/abc')
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('params.id')
  })

  it('stores a photo from the tablet and serves it back; refuses a file that is not an image', async () => {
    const { agent } = await signedIn(t, 'engineer')
    const site = (await agent.post('/api/sites').send(siteBody((await makeCompany(t)).id))).body
    const up = await agent
      .post(`/api/sites/${site.id}/photos`)
      .attach('photo', TINY_PNG, 'deck.png')
    expect(up.status).toBe(201)
    expect(up.body.photos).toHaveLength(1)
    const img = await agent.get(up.body.photos[0].url)
    expect(img.headers['content-type']).toBe('image/png')
    expect(Buffer.compare(img.body as Buffer, TINY_PNG)).toBe(0)
    const bad = await agent
      .post(`/api/sites/${site.id}/photos`)
      .attach('photo', Buffer.from('hello'), 'x.png')
    expect(bad.status).toBe(415)
    expect((await agent.get(`/api/sites/${site.id}`)).body.photos).toHaveLength(1)
  })
})
