import { describe, expect, it } from 'vitest'
import { randomBytes } from 'node:crypto'
import { signedIn } from '../helpers/factories'
import { DEMO_PRODUCT_LINES } from '../../seed/seed-catalogue'
import { seedCatalogue } from '../../seed/seed-catalogue'
import { quoteDesk, sizingSummary } from './quotes-rig'

const desk = quoteDesk()

const newLine = (overrides: Record<string, unknown> = {}) => ({
  ...DEMO_PRODUCT_LINES[0],
  code: `T-${randomBytes(3).toString('hex').toUpperCase()}`,
  ...overrides,
})

describe('catalogue', () => {
  it('lets the admin add and change a product line, and refuses a taken code', async () => {
    const body = newLine()
    const made = await desk.admin.post('/api/catalogue/lines').send(body)
    expect(made.status).toBe(201)
    expect(made.body.prices.EUR).toEqual({ base: 420_000, perKg: 1_800 })
    const changed = await desk.admin
      .put(`/api/catalogue/lines/${made.body.id}`)
      .send({ ...body, leadTimeWeeks: 11 })
    expect(changed.body.leadTimeWeeks).toBe(11)
    const dup = await desk.admin.post('/api/catalogue/lines').send(body)
    expect(dup.status).toBe(409)
    expect(dup.body.error.details[0].path).toBe('body.code')
  })

  it('refuses a range whose top is below its bottom and a fractional price, naming the field', async () => {
    const upside = await desk.admin.post('/api/catalogue/lines').send(newLine({ massMax: 10 }))
    expect(upside.status).toBe(400)
    expect(upside.body.error.details[0].path).toBe('body.massMax')
    const cents = await desk.admin
      .post('/api/catalogue/lines')
      .send(newLine({ prices: { EUR: { base: 10.5, perKg: 1 }, GBP: { base: 1, perKg: 1 } } }))
    expect(cents.body.error.details[0].path).toBe('body.prices.EUR.base')
  })

  it('shows prices to sales but not to engineers or production, and lets only the admin write', async () => {
    const { agent: sales } = await signedIn(desk.t, 'sales')
    expect((await sales.get('/api/catalogue/lines')).body[0].prices).not.toBeNull()
    for (const role of ['engineer', 'production'] as const) {
      const { agent } = await signedIn(desk.t, role)
      const lines = (await agent.get('/api/catalogue/lines')).body
      expect(lines.length).toBeGreaterThan(0)
      expect(lines.every((l: { prices: unknown }) => l.prices === null)).toBe(true)
      expect((await agent.get('/api/catalogue/options')).status).toBe(403)
    }
    expect((await sales.post('/api/catalogue/lines').send(newLine())).status).toBe(403)
    const { agent: customer } = await signedIn(desk.t, 'customer')
    expect((await customer.get('/api/catalogue/lines')).status).toBe(403)
  })

  it('lists the units that can carry a sizing first, and why the others cannot', async () => {
    const { agent: sales } = await signedIn(desk.t, 'sales')
    const s = sizingSummary(1)
    desk.sizings.put(s)
    const res = await sales.get('/api/catalogue/matches').query({ sizingId: s.id })
    expect(res.status).toBe(200)
    const byCode = new Map(res.body.map((m: { code: string }) => [m.code, m]))
    expect(byCode.get('FLR-S')).toMatchObject({ fits: true, builtMass: 220 })
    expect(byCode.get('SDL-H')).toMatchObject({ fits: false })
    expect(res.body[0].fits).toBe(true)
    const side = byCode.get('SDL-H') as { reasons: { field: string }[] }
    expect(side.reasons.map((r) => r.field)).toContain('orientation')
    expect((await sales.get('/api/catalogue/matches').query({ sizingId: 5 })).status).toBe(404)
  })

  it('seeds the demo catalogue once however often the seed runs', async () => {
    await seedCatalogue(desk.t.services)
    const codes = (await desk.admin.get('/api/catalogue/lines')).body.map(
      (l: { code: string }) => l.code,
    )
    expect(codes.filter((c: string) => c === 'FLR-S')).toHaveLength(1)
  })
})
