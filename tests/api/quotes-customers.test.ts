import { describe, expect, it } from 'vitest'
import request from 'supertest'
import { mailTo, signedIn } from '../helpers/factories'
import { customerWithContact, quoteDesk } from './quotes-rig'

const desk = quoteDesk()

describe('customers and contacts', () => {
  it('lets sales add a customer with a contact and find both in the list', async () => {
    const { agent } = await signedIn(desk.t, 'sales')
    const { company, contact } = await customerWithContact(agent)
    const list = await agent.get('/api/customers')
    const found = list.body.find((c: { id: number }) => c.id === company.id)
    expect(found.contacts.map((c: { id: number }) => c.id)).toEqual([contact.id])
    const dup = await agent.post('/api/customers').send({ name: company.name })
    expect(dup.status).toBe(409)
    const bad = await agent
      .post(`/api/customers/${company.id}/contacts`)
      .send({ name: 'X', email: 'nope' })
    expect(bad.status).toBe(400)
    expect(bad.body.error.details[0].path).toBe('body.email')
  })

  it('invites a contact as a customer user by an e-mailed link, once', async () => {
    const { agent } = await signedIn(desk.t, 'sales')
    const { company, contact } = await customerWithContact(agent)
    const res = await agent.post(`/api/customers/${company.id}/contacts/${contact.id}/invite`)
    expect(res.status).toBe(201)
    expect(res.body).toMatchObject({ role: 'customer', companyId: company.id, invited: true })
    const mail = await mailTo(desk.t, contact.email)
    expect(mail.text).toContain(`${desk.t.config.publicUrl}/set-password?token=`)
    const again = await agent.post(`/api/customers/${company.id}/contacts/${contact.id}/invite`)
    expect(again.status).toBe(409)
    const read = await agent.get(`/api/customers/${company.id}`)
    expect(read.body.contacts[0].userId).toBe(res.body.id)
  })

  it('invites a contact once when two invitations race, answering the other with 409', async () => {
    const { agent } = await signedIn(desk.t, 'sales')
    const { company, contact } = await customerWithContact(agent)
    const url = `/api/customers/${company.id}/contacts/${contact.id}/invite`
    const answers = await Promise.all([1, 2, 3].map(() => agent.post(url)))
    expect(answers.map((r) => r.status).sort()).toEqual([201, 409, 409])
  })

  it('answers 404 for a contact of another customer', async () => {
    const { agent } = await signedIn(desk.t, 'sales')
    const a = await customerWithContact(agent)
    const b = await customerWithContact(agent)
    const res = await agent.post(`/api/customers/${a.company.id}/contacts/${b.contact.id}/invite`)
    expect(res.status).toBe(404)
  })

  it('keeps customers from engineers, production and customers', async () => {
    for (const role of ['engineer', 'production', 'customer'] as const) {
      const { agent } = await signedIn(desk.t, role)
      expect((await agent.get('/api/customers')).status).toBe(403)
    }
    expect((await request(desk.t.app).get('/api/customers')).status).toBe(401)
  })
})
