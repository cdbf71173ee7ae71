import request from 'supertest'
import type { Page } from 'puppeteer-core'
import { spanModel } from '../../shared/dynamics'
import type { SizingInput } from '../../shared/schemas/sizing'
import { toAuthUser } from '../../server/modules/auth/auth.service'
import type { TestApp } from './app'
import { pageSignedInAs, type BrowserRig } from './browser'
import { makeUser, PASSWORD } from './factories'
import { makeCompany } from './records'

/**
 * A fresh engineer with a three-mass floor span (10 t masses, mode 1 at 5.8 Hz, invented) and a
 * draft sizing on it: one absorber at midspan for mode 1, unless `input` says otherwise.
 */
export async function engineerWithSizing(
  t: TestApp,
  opts: { companyId?: number; input?: Partial<SizingInput> } = {},
) {
  const s = t.services
  const engineer = await makeUser(t, 'engineer')
  const user = toAuthUser((await s.users.findByEmail(engineer.email))!)
  const site = await s.sites.create(user, {
    name: `Round-trip floor ${engineer.id}`,
    companyId: opts.companyId ?? (await makeCompany(t)).id,
    structureKind: 'floor',
    address: '',
    contactName: '',
    contactPhone: '',
    notes: '',
  })
  const m = spanModel(3, 30_000, 5.8)
  const definition = { nodes: m.nodes, springs: m.springs, hostDampingRatio: 0.02 }
  const model = await s.models.create(user, {
    siteId: site.id,
    name: 'Bay span',
    definition,
    reason: 'first version',
  })
  const input: SizingInput = {
    title: 'Bay absorber',
    siteId: site.id,
    modelId: model.id,
    modelRevision: 1,
    targetMode: 1,
    absorberNode: 'node-2',
    excitationNode: 'node-2',
    responseNode: 'node-2',
    forceAmplitude: 280,
    massRatio: 0.02,
    tuning: 'optimize',
    orientation: 'vertical',
    acceptance: { label: 'custom', quantity: 'acceleration', limit: 0.05 },
    detuningTolerance: 0.1,
    ...opts.input,
  }
  const sizing = await s.sizings.create(user, input)
  return { engineer, user, sizing, input, modelId: model.id }
}

/**
 * engineerWithSizing, with the engineer signed in twice: in a fresh page of the browser and in an
 * API agent that reads what the server stored. `base` is the sizing's address in the client.
 */
export async function engineerOnSizing(rig: BrowserRig) {
  const made = await engineerWithSizing(rig.t)
  const page = await pageSignedInAs(rig, made.engineer)
  const agent = request.agent(rig.t.app)
  await agent.post('/api/auth/sign-in').send({ email: made.engineer.email, password: PASSWORD })
  return { ...made, page, agent, base: `${rig.url}/sizings/${made.sizing.id}` }
}

/** Opens a step from the server's copy alone (no draft in the browser), as on another tablet. */
export async function reopen(page: Page, url: string, field: string) {
  await page.evaluate(() => localStorage.clear())
  await page.goto(url)
  await page.waitForSelector(field)
}
