import { randomBytes } from 'node:crypto'
import type { Agent } from 'supertest'
import { afterAll, beforeAll } from 'vitest'
import { pino } from 'pino'
import { createApp } from '../../server/app'
import { smtpMailer } from '../../server/integrations/mail'
import { closePdfRenderers } from '../../server/integrations/pdf/renderer'
import { memorySizingSource } from '../helpers/memory-sizing-source'
import type { SizingPool } from '../../server/workers/pool'
import type { SizingSummary } from '../../shared/schemas/sizing'
import { seedCatalogue } from '../../seed/seed-catalogue'
import { makeTestApp, type TestApp } from '../helpers/app'
import { signedIn } from '../helpers/factories'
import {
  OFFICE_FLOOR,
  OFFICE_FLOOR_ABSORBER,
  OFFICE_FLOOR_ACCEPTANCE,
} from '../helpers/office-floor'

/** Quotes never solve a sizing; a call here would be a wiring mistake worth a loud failure. */
export const noSolving: SizingPool = {
  run: () => Promise.reject(new Error('the quotes tests do not solve sizings')),
  identify: () => Promise.reject(new Error('the quotes tests do not read records')),
  peakAt: () => Promise.reject(new Error('the quotes tests do not read records')),
  measure: () => Promise.reject(new Error('the quotes tests do not identify records')),
  close: async () => undefined,
}

/**
 * The test app rebuilt with sizings held in memory, so each test states the exact absorber
 * values its hand-checked prices rest on, and with the demo catalogue loaded. With
 * `solvedSizings` the app keeps its real sizings service and worker pool instead.
 */
export async function makeQuoteApp(
  extraEnv: Record<string, string> = {},
  opts: { solvedSizings?: boolean } = {},
) {
  const t: TestApp = await makeTestApp(extraEnv)
  const sizings = memorySizingSource()
  const close = t.close
  t.close = async () => {
    await closePdfRenderers()
    await close()
  }
  if (opts.solvedSizings) {
    await seedCatalogue(t.services)
    return { t, sizings }
  }
  const deps = {
    config: t.config,
    dataSource: t.ds,
    mailer: smtpMailer(t.config),
    logger: pino({ level: 'silent' }),
    now: () => new Date(Date.now() + t.clock.offsetMs),
    pool: noSolving,
    sizingSource: sizings,
    checkResponses: true,
  }
  const rebuilt = createApp(deps)
  t.services = rebuilt.services
  t.app = rebuilt.app
  await seedCatalogue(t.services)
  // The test database is shared by the files of a run: held sizings take ids no quote has yet.
  const [{ top }] = await t.ds.query('SELECT COALESCE(MAX(sizingId), 0) AS top FROM quotes')
  nextId = Math.max(nextId, Number(top) + 1)
  return { t, sizings }
}

let nextId = 900_000

/** A submitted sizing of the invented office floor (tests/helpers/office-floor.ts). */
export function sizingSummary(companyId: number, overrides: Partial<SizingSummary> = {}) {
  const omega = 2 * Math.PI * OFFICE_FLOOR_ABSORBER.frequencyHz
  const f = Array.from({ length: 41 }, (_, i) => 5 + i * 0.1)
  const s: SizingSummary = {
    id: nextId++,
    revision: 1,
    title: 'Level 3 office floor, walking',
    state: 'submitted',
    siteId: 1,
    siteName: 'Harbour Row offices, level 3',
    companyId,
    companyName: 'customer',
    ownerName: 'Field engineer',
    targetMode: 1,
    ...OFFICE_FLOOR,
    absorber: OFFICE_FLOOR_ABSORBER,
    load: 'Harmonic force 280 N at node-3',
    staticDeflection: 9.81 / (omega * omega),
    acceptance: OFFICE_FLOOR_ACCEPTANCE,
    chart: {
      frequencyHz: f,
      without: f.map((x) => 1 / Math.abs(1 - (x / 6.9) ** 2 + 0.02)),
      with: f.map((x) => 1 / (Math.abs(1 - (x / 6.9) ** 2) + 0.25)),
    },
    submittedAt: '2026-01-05T10:00:00.000Z',
    handoverNote: '',
    ...overrides,
  }
  return s
}

/** A date n days from the test clock's today, YYYY-MM-DD. */
export function daysFromNow(t: TestApp, n: number) {
  return new Date(Date.now() + t.clock.offsetMs + n * 86_400_000).toISOString().slice(0, 10)
}

/** A fresh customer company with one contact, made through the API as sales would. */
export async function customerWithContact(agent: Agent) {
  const tag = randomBytes(3).toString('hex')
  const company = await agent
    .post('/api/customers')
    .send({ name: `Quay Client ${tag}`, address: '2 Dock Rd' })
  if (company.status !== 201) throw new Error(`customer: ${JSON.stringify(company.body)}`)
  const contact = await agent
    .post(`/api/customers/${company.body.id}/contacts`)
    .send({ name: 'Dana Whitlock', email: `dana-${tag}@client.test`, position: 'Project manager' })
  if (contact.status !== 201) throw new Error(`contact: ${JSON.stringify(contact.body)}`)
  return {
    company: company.body as { id: number; name: string },
    contact: contact.body as { id: number; email: string },
  }
}

/** Catalogue ids by code, for building lines. */
export async function catalogueIds(agent: Agent) {
  const lines = (await agent.get('/api/catalogue/lines')).body as { id: number; code: string }[]
  const options = (await agent.get('/api/catalogue/options')).body as { id: number; code: string }[]
  const unit = (code: string) => lines.find((l) => l.code === code)!.id
  const option = (code: string) => options.find((o) => o.code === code)!.id
  return { unit, option }
}

/** A fresh named tax rate (not the default), made as the admin would; answers its id. */
export async function taxRate(t: TestApp, rateBp: number) {
  const name = `Rate ${rateBp} ${randomBytes(3).toString('hex')}`
  return (await t.services.tax.save(null, { name, rateBp, isDefault: false })).id
}

/** What a quotes test file works with; its fields are set before the file's first test. */
export interface QuoteDesk {
  t: TestApp
  /** the sizings the quotes read, held in memory: put one in to quote it */
  sizings: ReturnType<typeof memorySizingSource>
  sales: Agent
  admin: Agent
  /** the demo catalogue's ids by code */
  ids: Awaited<ReturnType<typeof catalogueIds>>
  /** A fresh customer with one contact, and a submitted sizing of theirs held to quote. */
  customerSizing: (overrides?: Partial<SizingSummary>) => Promise<{
    company: { id: number; name: string }
    contact: { id: number; email: string }
    sizing: SizingSummary
  }>
}

/**
 * The common start of a quotes test file: the quote app (makeQuoteApp) with sales and the admin
 * signed in, made before the file's tests and closed after them. Read its fields in tests and
 * hooks, not at the top of the file (they are set in beforeAll).
 */
export function quoteDesk(): QuoteDesk {
  const desk = {
    async customerSizing(overrides = {}) {
      const { company, contact } = await customerWithContact(desk.sales)
      const sizing = sizingSummary(company.id, overrides)
      desk.sizings.put(sizing)
      return { company, contact, sizing }
    },
  } as QuoteDesk
  beforeAll(async () => {
    const { t, sizings } = await makeQuoteApp()
    const sales = (await signedIn(t, 'sales')).agent
    const admin = (await signedIn(t, 'admin')).agent
    Object.assign(desk, { t, sizings, sales, admin, ids: await catalogueIds(sales) })
  })
  afterAll(() => desk.t.close())
  return desk
}
