import { describe, expect, it } from 'vitest'
import { ModelError } from '../../shared/dynamics/index'
import { identifyModes } from '../../shared/measurements/index'
import { modelSchema, type ModelInput } from '../../shared/schemas/model'
import { mac, sensorsFromChannels, updateModel } from '../../shared/updating/index'
import { ambientResponse, type NormalMode } from './helpers/chain'

// Three masses m between two supports; the two support springs k_e, the two inner ones k.
// The middle mass is μm. Modes by hand from K φ = λ M φ (symmetric structure):
//   antisymmetric [1, 0, −1]: λ = (k_e + k)/m;
//   symmetric [1, a, 1]: μ k a² + (2k − μ(k_e + k)) a − 2k = 0, λ = (k_e + k − k a)/m.
// Check: k_e = k, μ = 1 gives a = ±√2 and λ = (2 ∓ √2)k/m = 4 sin²(rπ/8)k/m, the uniform
// chain's closed form (docs/engineering/host-model.md#chain-check-values).
const m = 1000
const k = ((2 * Math.PI * 3) ** 2 * m) / (4 * Math.sin(Math.PI / 8) ** 2)

function symmetricChainModes(ke: number, mu: number): NormalMode[] {
  const b = 2 * k - mu * (ke + k)
  const roots = [1, -1].map((s) => (-b + s * Math.sqrt(b * b + 8 * mu * k * k)) / (2 * mu * k))
  const modes = [
    ...roots.map((a) => ({
      lambda: (ke + k - k * a) / m,
      shape: [1, a, 1],
      mass: 2 * m + mu * m * a * a,
    })),
    { lambda: (ke + k) / m, shape: [1, 0, -1], mass: 2 * m },
  ]
  return modes
    .sort((p, q) => p.lambda - q.lambda)
    .map((x) => ({
      frequencyHz: Math.sqrt(x.lambda) / (2 * Math.PI),
      dampingRatio: 0.02,
      shape: x.shape.map((v) => v / Math.sqrt(x.mass)),
    }))
}

const nominal: ModelInput = {
  nodes: [
    { id: 'left', fixed: true },
    { id: 'm1', mass: m },
    { id: 'm2', mass: m },
    { id: 'm3', mass: m },
    { id: 'right', fixed: true },
  ],
  springs: [
    { from: 'left', to: 'm1', stiffness: k },
    { from: 'm1', to: 'm2', stiffness: k },
    { from: 'm2', to: 'm3', stiffness: k },
    { from: 'm3', to: 'right', stiffness: k },
  ],
  hostDampingRatio: 0.02,
}
const sensors = [{ nodeId: 'm1' }, { nodeId: 'm2' }, { nodeId: 'm3' }]
const supports = { kind: 'stiffness' as const, name: 'support springs', springs: [0, 3] }

describe('updateModel (eigenvalue sensitivities, Fox & Kapoor 1968; MAC, Allemang & Brown 1982)', () => {
  const truth = symmetricChainModes(1.25 * k, 1)

  it('checks the hand-derived modes against the uniform chain closed form', () => {
    const uniform = symmetricChainModes(k, 1)
    const closed = [1, 2, 3].map(
      (r) => (Math.sqrt((4 * k) / m) * Math.sin((r * Math.PI) / 8)) / (2 * Math.PI),
    )
    uniform.forEach((mode, i) => expect(mode.frequencyHz).toBeCloseTo(closed[i]!, 10))
  })

  it('recovers a stiffness scale of the support springs from three measured modes', () => {
    const measured = truth.map((t) => ({ frequencyHz: t.frequencyHz, shape: t.shape }))
    const u = updateModel(nominal, measured, [supports], sensors)
    expect(u.converged).toBe(true)
    expect(Math.abs(u.factors[0]!.factor / 1.25 - 1)).toBeLessThan(0.01)
    expect(u.factors[0]!.factor).toBeCloseTo(1.25, 8)
    expect(u.residual.before).toBeGreaterThan(0.03)
    expect(u.residual.after).toBeLessThan(1e-9)
    expect(u.model.springs.map((s) => s.stiffness / k)).toEqual([
      expect.closeTo(1.25, 8),
      1,
      1,
      expect.closeTo(1.25, 8),
    ])
    expect(modelSchema.safeParse(u.model).success).toBe(true)
    expect(u.model.hostDampingRatio).toBe(0.02)
    for (const p of u.pairs) {
      expect(p.modelMode).toBe(p.measured + 1)
      expect(p.macAfter).toBeGreaterThan(1 - 1e-12)
      expect(p.macBefore!).toBeLessThanOrEqual(p.macAfter! + 1e-12)
    }
    expect(u.reason).toMatch(
      /^updated to 3 measured mode\(s\), rms frequency error \d+\.\d\d % → 0\.00 %: support springs ×1\.2500$/,
    )
  })

  it('pairs by frequency when the measured modes carry no shape', () => {
    const measured = truth.map((t) => ({ frequencyHz: t.frequencyHz }))
    const u = updateModel(nominal, measured, [supports])
    expect(u.factors[0]!.factor).toBeCloseTo(1.25, 8)
    expect(u.pairs.map((p) => [p.pairedBy, p.macAfter])).toEqual([
      ['frequency', null],
      ['frequency', null],
      ['frequency', null],
    ])
  })

  it('pairs shuffled modes by MAC, with a sensor mounted the other way round', () => {
    const flipped = [...sensors.slice(0, 2), { nodeId: 'm3', sign: -1 as const }]
    const measured = [2, 0, 1].map((r) => {
      const t = truth[r]!
      return { frequencyHz: t.frequencyHz, shape: [t.shape[0]!, t.shape[1]!, -t.shape[2]!] }
    })
    const u = updateModel(nominal, measured, [supports], flipped)
    expect(u.pairs.map((p) => p.modelMode)).toEqual([3, 1, 2])
    expect(u.factors[0]!.factor).toBeCloseTo(1.25, 8)
  })

  it('adjusts a mass and a stiffness group together (middle mass ×1.2, supports ×1.25)', () => {
    const both = symmetricChainModes(1.25 * k, 1.2)
    const measured = both.map((t) => ({ frequencyHz: t.frequencyHz, shape: t.shape }))
    const middle = { kind: 'mass' as const, name: 'middle mass', nodes: ['m2'] }
    const u = updateModel(nominal, measured, [supports, middle], sensors)
    expect(u.factors.map((f) => f.factor)).toEqual([
      expect.closeTo(1.25, 7),
      expect.closeTo(1.2, 7),
    ])
    expect(u.model.nodes[2]!.mass).toBeCloseTo(1200, 4)
  })

  it('stops at a bound and says so', () => {
    const measured = truth.map((t) => ({ frequencyHz: t.frequencyHz, shape: t.shape }))
    const u = updateModel(nominal, measured, [{ ...supports, upper: 1.1 }], sensors)
    expect(u.factors[0]).toMatchObject({ factor: 1.1, atBound: true })
    expect(u.residual.after).toBeGreaterThan(0)
    expect(u.residual.after).toBeLessThan(u.residual.before)
    expect(u.warnings).toContain(
      "'support springs' stopped at its bound (×1.1): the model may lack something",
    )
  })

  it('recovers the scale within 1 % from modes identified on a synthesized ambient record', () => {
    // EFDD of 2400 s at 25 Hz of the stiffened chain (see oma-chain.test.ts), channels tied
    // to the three masses; the identified frequencies and shapes drive the update.
    const channels = ambientResponse(truth, 25, 2400, 100, 0.01, 31).map((acceleration, i) => ({
      name: `m${i + 1}`,
      acceleration,
      nodeId: `m${i + 1}`,
      direction: '+z' as const,
    }))
    const identified = identifyModes({ sampleRateHz: 25, channels })
    expect(identified.modes).toHaveLength(3)
    const measured = identified.modes.map((mode) => ({
      frequencyHz: mode.frequencyHz,
      shape: mode.shape,
    }))
    const u = updateModel(nominal, measured, [supports], sensorsFromChannels(channels))
    expect(Math.abs(u.factors[0]!.factor / 1.25 - 1)).toBeLessThan(0.01)
    for (const p of u.pairs) expect(p.macAfter).toBeGreaterThan(0.98)
    expect(mac(measured[0]!.shape, truth[0]!.shape)).toBeGreaterThan(0.98)
  })

  it('names the field of a bad group, sensor or measured mode', () => {
    const one = [{ frequencyHz: 3, shape: [1, 1, 1] }]
    const cases: [() => unknown, string][] = [
      [
        () => updateModel(nominal, one, [{ kind: 'stiffness', springs: [7] }], sensors),
        'groups[0].springs[0]: no spring at index 7',
      ],
      [
        () => updateModel(nominal, one, [supports, { kind: 'stiffness', springs: [3] }], sensors),
        'groups[1]: shares a spring with groups[0]',
      ],
      [
        () => updateModel(nominal, one, [{ kind: 'mass', nodes: ['left'] }], sensors),
        "groups[0].nodes[0]: node 'left' is fixed: it has no mass to scale",
      ],
      [
        () => updateModel(nominal, one, [{ ...supports, lower: 1.1 }], sensors),
        'groups[0].upper: bounds must enclose 1 (the model as it is), got 1.1…4',
      ],
      [
        () => updateModel(nominal, one, [supports], sensors.slice(1)),
        'measured[0].shape: has 3 entries for 2 sensor(s): one entry per sensor',
      ],
      [
        () => updateModel(nominal, one, [supports], [{ nodeId: 'left' }, ...sensors.slice(1)]),
        "sensors[0].nodeId: node 'left' is fixed: it does not move in any mode",
      ],
      [
        () => updateModel(nominal, [{ frequencyHz: -1 }], [supports]),
        'measured[0].frequencyHz: must be a positive number of Hz, got -1',
      ],
    ]
    for (const [run, message] of cases) {
      expect(run).toThrow(ModelError)
      expect(run).toThrow(message)
    }
  })
})
