import type { Services } from '../server/app'
import { toAuthUser } from '../server/modules/auth/auth.service'
import type { AuthUser } from '../server/middleware/authenticate'
import { acceptancePreset } from '../shared/acceptance-presets'
import { spanModel } from '../shared/dynamics'
import { LOAD_PRESETS } from '../shared/load-presets'
import type { ModelDefinition, SizingInput } from '../shared/schemas/sizing'

/** Invented demo sites; the names, places and figures are made up. */
export const DEMO_OFFICE_SITE = 'Harbour Light offices, level 4 floor'
export const DEMO_OFFICE_SIZING = 'Level 4 bay C floor absorber'
export const DEMO_FOOTBRIDGE_SITE = 'Millrace footbridge'

function span(n: number, totalMass: number, hz: number, zeta: number): ModelDefinition {
  const m = spanModel(n, totalMass, hz)
  return { nodes: m.nodes, springs: m.springs, hostDampingRatio: zeta }
}

function acceptance(id: string): SizingInput['acceptance'] {
  const p = acceptancePreset(id)
  if (!p) throw new Error(`seed: no acceptance preset ${id}`)
  return {
    presetId: p.id,
    label: `${p.label}, ${p.statedAs}`,
    quantity: p.quantity,
    limit: p.limit,
  }
}

function load(id: string) {
  const p = LOAD_PRESETS.find((x) => x.id === id)
  if (!p) throw new Error(`seed: no load preset ${id}`)
  return { forceAmplitude: p.force, loadPresetId: p.id }
}

async function scenario(
  s: Services,
  user: AuthUser,
  site: { name: string; companyId: number; structureKind: 'floor' | 'footbridge'; notes: string },
  model: { name: string; definition: ModelDefinition },
  sizing: Omit<SizingInput, 'siteId' | 'modelId' | 'modelRevision'>,
) {
  const created = await s.sites.create(user, {
    ...site,
    address: '',
    contactName: 'Facilities manager',
    contactPhone: '',
  })
  const m = await s.models.create(user, { siteId: created.id, ...model, reason: 'first version' })
  return s.sizings.create(user, {
    ...sizing,
    siteId: created.id,
    modelId: m.id,
    modelRevision: m.currentRevision,
  })
}

/**
 * The demo sizings: an office floor sized and handed to sales (the quote demo starts from it) and
 * a footbridge still in draft. Skipped when the office site exists already. Load the catalogue
 * first: the handover checks the office absorber against it.
 */
export async function seedSizings(s: Services, opts: { companyIds: Map<string, number> }) {
  const existing = await s.sites.list({ search: DEMO_OFFICE_SITE })
  if (existing.some((x) => x.name === DEMO_OFFICE_SITE)) return
  const engineer = await s.users.findByEmail('engineer@quellnode.test')
  const marlow = opts.companyIds.get('Marlow Quay Developments')
  const brackenfield = opts.companyIds.get('Brackenfield Foods plc')
  if (!engineer || !marlow || !brackenfield) throw new Error('seed: run seedPeople first')
  const user = toAuthUser(engineer)

  // A long-span composite floor bay lumped into five masses, 5.8 Hz, 3 % damping (fitted out).
  const office = await scenario(
    s,
    user,
    {
      name: DEMO_OFFICE_SITE,
      companyId: marlow,
      structureKind: 'floor',
      notes: 'Complaints of floor bounce near the bay C meeting rooms.',
    },
    { name: 'Bay C span, five masses', definition: span(5, 120_000, 5.8, 0.03) },
    {
      title: DEMO_OFFICE_SIZING,
      targetMode: 1,
      absorberNode: 'node-3',
      excitationNode: 'node-3',
      responseNode: 'node-3',
      ...load('walker-first-harmonic'),
      massRatio: 0.02,
      tuning: 'optimize',
      orientation: 'vertical',
      acceptance: acceptance('aisc-office'),
      detuningTolerance: 0.1,
    },
  )
  await s.sizings.submit(user, office.id, {
    revision: office.currentRevision,
    note: 'Ceiling void access from the level 3 plant room; lift via the goods hoist.',
  })

  // A light steel footbridge over the mill race, 2.1 Hz, 0.8 % damping: a draft in progress.
  await scenario(
    s,
    user,
    {
      name: DEMO_FOOTBRIDGE_SITE,
      companyId: brackenfield,
      structureKind: 'footbridge',
      notes: 'Staff crossing between the bakery and the dispatch yard.',
    },
    { name: 'Main span, seven masses', definition: span(7, 12_000, 2.1, 0.008) },
    {
      title: 'Millrace footbridge vertical absorber',
      targetMode: 1,
      absorberNode: 'node-4',
      excitationNode: 'node-4',
      responseNode: 'node-4',
      ...load('aisc-footbridge-p0'),
      massRatio: 0.03,
      tuning: 'optimize',
      orientation: 'vertical',
      acceptance: acceptance('hivoss-cl2'),
      detuningTolerance: 0.1,
    },
  )
}
