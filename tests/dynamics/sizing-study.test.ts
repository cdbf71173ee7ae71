import { describe, expect, it } from 'vitest'
import { solveSizing, spanModel } from '../../shared/dynamics'
import { SizingInputSchema, type SizingInput } from '../../shared/schemas/sizing'
import { evaluateSizing } from '../../shared/sizing/evaluate-sizing'
import { describeLoad } from '../../shared/sizing/load-description'
import { toModelInput } from '../../shared/sizing/model-input'

const span = spanModel(5, 5 * 2000, 4)
const model = { nodes: span.nodes, springs: span.springs, hostDampingRatio: 0.01 }

function input(extra: Record<string, unknown> = {}): SizingInput {
  return SizingInputSchema.parse({
    title: 'Plant deck',
    siteId: 1,
    modelId: 1,
    modelRevision: 1,
    targetMode: 1,
    absorberNode: 'node-3',
    excitationNode: 'node-3',
    responseNode: 'node-3',
    forceAmplitude: 400,
    massRatio: 0.03,
    acceptance: { label: 'custom', quantity: 'acceleration', limit: 0.5 },
    ...extra,
  })
}

describe('the sizing study reads the new choices', () => {
  it('an older saved input without the new fields still parses and means one force', () => {
    const i = input()
    expect(i.loadKind).toBeUndefined()
    const req = toModelInput(model, i)
    expect(req.excitation).toEqual({ node: 'node-3', amplitude: 400 })
    expect(req.response).toEqual({ node: 'node-3', quantity: 'acceleration' })
    expect(describeLoad(i)).toBe('Harmonic force 400 N at node-3')
  })

  // Source: the checks are the engine's true peaks times the design load (common practice: a
  // linear model scales with its load).
  it('checks the acceptance quantity at the design load, minimised by the engine', () => {
    const i = input({ loadKind: 'base', baseAcceleration: 0.3 })
    const ev = evaluateSizing(model, i)
    expect(ev.result.response).toMatchObject({ quantity: 'acceleration', frame: 'absolute' })
    expect(ev.checks.forceAmplitude).toBe(0.3)
    expect(ev.checks.loadUnit).toBe('m/s²')
    expect(ev.checks.responseWith).toBeCloseTo((ev.result.peak.with ?? 0) * 0.3, 12)
    expect(ev.checks.stroke).toBeCloseTo((ev.result.design?.maxStrokePerForce ?? 0) * 0.3, 12)
    expect(describeLoad(i)).toBe('Support (base) acceleration 0.3 m/s²')
  })

  it('maps a running-speed range, an unbalance, a stroke limit and a relative absorber', () => {
    const i = input({
      unbalance: 0.05,
      speed: { minHz: 3.4, maxHz: 3.8 },
      strokeLimit: 0.01,
      relativeToNode: 'node-2',
    })
    const req = toModelInput(model, i)
    expect(req.excitation).toEqual({ node: 'node-3', unbalance: true, amplitude: 0.05 })
    expect(req.absorber).toMatchObject({ relativeTo: 'node-2', strokeLimit: 0.01 })
    const ev = evaluateSizing(model, i)
    expect(ev.result.band).toMatchObject({ minHz: 3.4, maxHz: 3.8, source: 'speed' })
    expect(ev.checks.strokeLimit).toBe(0.01)
    expect(ev.checks.stroke).toBeLessThanOrEqual(0.01)
    expect(ev.result).toEqual(solveSizing(req))
    expect(describeLoad(i)).toBe(
      'Rotating machine at node-3: running speeds 204–228 rpm (3.4–3.8 Hz), unbalance 0.05 kg·m',
    )
  })

  // 1480 rpm = 1480/60 rev/s = 24.67 Hz (definition of the revolution)
  it('states each load kind with its amplitude, a machine speed in rpm as well as Hz', () => {
    const speed = { hz: 1480 / 60 }
    expect(describeLoad(input({ unbalance: 0.02, speed }))).toBe(
      'Rotating machine at node-3: running speed 1480 rpm (24.7 Hz), unbalance 0.02 kg·m',
    )
    expect(describeLoad(input({ unbalance: 0.02 }))).toBe('Rotating unbalance 0.02 kg·m at node-3')
    expect(describeLoad(input({ loadKind: 'base', baseAcceleration: 0.4, speed }))).toBe(
      'Support (base) acceleration 0.4 m/s², running speed 1480 rpm (24.7 Hz)',
    )
    expect(describeLoad(input({ loadKind: 'mode-shaped', forceAmplitude: 700 }))).toBe(
      '700 N in total, shaped like mode 1',
    )
    const forces = [
      { node: 'node-2', amplitude: 150 },
      { node: 'node-4', amplitude: 150 },
    ]
    expect(describeLoad(input({ loadKind: 'forces', forces }))).toBe(
      'Force vector 150 N at node-2, 150 N at node-4',
    )
  })

  it('refuses fields that belong to another load kind, naming them', () => {
    const r = SizingInputSchema.safeParse({ ...input(), baseAcceleration: 0.2 })
    expect(r.error?.issues.map((x) => [x.path.join('.'), x.message])).toEqual([
      ['baseAcceleration', "only for loadKind 'base'"],
    ])
    const missing = SizingInputSchema.safeParse({ ...input(), loadKind: 'forces' })
    expect(missing.error?.issues[0]).toMatchObject({
      path: ['forces'],
      message: "required for loadKind 'forces'",
    })
  })
})
