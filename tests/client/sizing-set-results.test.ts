import { describe, expect, it } from 'vitest'
import { mount } from '@vue/test-utils'
import { spanModel } from '../../shared/dynamics'
import type { SizingInput } from '../../shared/schemas/sizing'
import { evaluateSizing } from '../../shared/sizing/evaluate-sizing'
import SizingSetResults from '../../src/features/sizing/components/SizingSetResults.vue'

/** A floor span of three 10 t masses (invented) with a unit at midspan for mode 1 and one at the
 * quarter point for mode 2, loaded and read at the quarter point, where mode 2 governs. */
function quarterPointSet() {
  const m = spanModel(3, 30_000, 5.8)
  const model = { nodes: m.nodes, springs: m.springs, hostDampingRatio: 0.02 }
  const input: SizingInput = {
    title: 'Bay floor, two modes',
    siteId: 1,
    modelId: 1,
    modelRevision: 1,
    targetMode: 1,
    absorberNode: 'node-2',
    excitationNode: 'node-1',
    responseNode: 'node-1',
    forceAmplitude: 280,
    massRatio: 0.01,
    tuning: 'optimize',
    orientation: 'vertical',
    acceptance: { label: 'custom', quantity: 'acceleration', limit: 0.5 },
    detuningTolerance: 0.1,
    absorbers: [{ node: 'node-1', targetMode: 2, massRatio: 0.01 }],
  }
  const set = evaluateSizing(model, input).set
  if (!set) throw new Error('expected a set')
  return set
}

describe('every absorber of a set on the results step', () => {
  const set = quarterPointSet()

  it('says beside a unit that barely moves the peak that it carries the Den Hartog tuning', () => {
    const w = mount(SizingSetResults, { props: { set } })
    const rows = w.findAll('[data-test="set-unit"]')
    expect(rows).toHaveLength(2)
    const note = rows[0]!.find('[data-test="set-unit-basis"]')
    expect(note.exists()).toBe(true)
    expect(note.text()).toMatch(
      /Den Hartog tuning for its mode: this absorber barely changes the peak at the response point \(0\.\d+ %\)\. Check its effect at other points\./,
    )
    // Source: Den Hartog, Mechanical Vibrations, 1956: ζ_a = √(3μ/(8(1+μ))) on the unit's own
    // frequency, 6.1 % for μ = 0.01 (docs/engineering/tuning.md#den-hartog-tuning).
    expect(rows[0]!.text()).toContain('6.1 %')
    expect(rows[1]!.find('[data-test="set-unit-basis"]').exists()).toBe(false)
  }, 60_000)

  it('shows no such note for a result stored before units were marked', () => {
    const older = {
      ...set,
      absorbers: set.absorbers.map(({ tuningBasis: _b, publishedPeakChange: _c, ...u }) => u),
    }
    const w = mount(SizingSetResults, { props: { set: older } })
    expect(w.findAll('[data-test="set-unit"]')).toHaveLength(2)
    expect(w.find('[data-test="set-unit-basis"]').exists()).toBe(false)
  })
})
