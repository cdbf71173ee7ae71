import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h, nextTick, ref } from 'vue'
import { mount } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { ModelDefinition, SizingInput } from '../../shared/schemas/sizing'
import {
  defaultDefinition,
  newDraft,
  toSizingInput,
  type SizingForm,
} from '../../src/features/sizing/draft'
import { useSizingDraftStore } from '../../src/features/sizing/draft-store'
import { previewSizing, type SizingPreview } from '../../src/features/sizing/preview'
import { useAutoChoices } from '../../src/features/sizing/useAutoChoices'
import { useLivePreview } from '../../src/features/sizing/useLivePreview'

/** Runs a composable inside a mounted component (its watchers and unmount hooks work there). */
function inComponent<T>(setup: () => T): T {
  let out: T | undefined
  mount(
    defineComponent({
      setup() {
        out = setup()
        return () => h('div')
      },
    }),
  )
  return out as T
}

/** Two equal storeys on equal springs from the ground: a shear frame with two modes. */
function twoStoreys(m = 10_000, k = 4e7): ModelDefinition {
  return {
    nodes: [
      { id: 'ground', fixed: true },
      { id: 'level-1', mass: m },
      { id: 'level-2', mass: m },
    ],
    springs: [
      { from: 'ground', to: 'level-1', stiffness: k },
      { from: 'level-1', to: 'level-2', stiffness: k },
    ],
    hostDampingRatio: 0.02,
  }
}

function inputFor(nodes: Partial<SizingInput> = {}): SizingInput {
  return { ...toSizingInput(newDraft(1, '2026-01-05T08:00:00.000Z')), ...nodes }
}

describe('the live preview of a sizing', () => {
  it('finds the natural frequency of the one-mass start model, √(k/m)/2π', () => {
    const def = defaultDefinition()
    const k = def.springs[0]!.stiffness
    const m = def.nodes.find((n) => !n.fixed)!.mass!
    // Undamped natural frequency of a single degree of freedom, f = √(k/m) / 2π
    // (Rao, Mechanical Vibrations, 6th ed., ch. 2 (memory)).
    const expected = Math.sqrt(k / m) / (2 * Math.PI)
    const p = previewSizing(def, inputFor())
    expect(p.error).toBeNull()
    expect(p.modes[0]!.frequencyHz).toBeCloseTo(expected, 9)
    expect(expected).toBeCloseTo(5.8, 9)
    expect(p.evaluation).toBeNull() // no nodes chosen yet
  })

  it('tunes a Den Hartog absorber to f = 1/(1+μ) of the host frequency', () => {
    const mu = 0.02
    const input = inputFor({
      absorberNode: 'host',
      excitationNode: 'host',
      responseNode: 'host',
      massRatio: mu,
      tuning: 'den-hartog',
    })
    const p = previewSizing(defaultDefinition(), input)
    // Den Hartog, Mechanical Vibrations (1956), optimum tuning for a force on an undamped host.
    expect(p.evaluation?.result.absorber?.frequencyRatio).toBeCloseTo(1 / (1 + mu), 9)
  })

  it('names the field at fault instead of failing when the structure cannot be solved', () => {
    const def = defaultDefinition()
    def.springs = []
    const p = previewSizing(def, inputFor())
    expect(p.modes).toEqual([])
    expect(p.error?.message).toBeTruthy()
  })

  describe('recomputed as the engineer types', () => {
    beforeEach(() => {
      vi.useFakeTimers()
      vi.stubGlobal('Worker', InlineWorker)
    })
    afterEach(() => {
      vi.useRealTimers()
      vi.unstubAllGlobals()
    })

    it('waits 150 ms after the last change and shows the answer to the latest one', async () => {
      const source = ref({ model: defaultDefinition(), input: inputFor() })
      const { preview } = inComponent(() => useLivePreview(source))
      await vi.advanceTimersByTimeAsync(200)
      const first = preview.value?.modes[0]?.frequencyHz ?? 0
      expect(first).toBeCloseTo(5.8, 6)
      // Four times the mass: the frequency halves, but only once the typing has paused.
      for (const mass of [40_000, 60_000, 80_000]) {
        source.value.model.nodes[1]!.mass = mass
        await nextTick()
        await vi.advanceTimersByTimeAsync(100)
        expect(preview.value?.modes[0]?.frequencyHz).toBe(first)
      }
      await vi.advanceTimersByTimeAsync(150)
      expect(preview.value?.modes[0]?.frequencyHz).toBeCloseTo(first / 2, 6)
    })
  })
})

/** The preview worker's message loop (preview.worker.ts) in this thread: jsdom has no workers. */
class InlineWorker {
  onmessage: ((e: MessageEvent) => void) | null = null
  onerror: (() => void) | null = null
  postMessage(data: { id: number; model: ModelDefinition; input: SizingInput }) {
    const preview = previewSizing(data.model, data.input)
    queueMicrotask(() => this.onmessage?.({ data: { id: data.id, preview } } as MessageEvent))
  }
  terminate() {}
}

it('says the live preview cannot run where no worker starts, shows no numbers and still offers the nodes', async () => {
  vi.useFakeTimers()
  try {
    const source = ref({ model: defaultDefinition(), input: inputFor() })
    const { preview } = inComponent(() => useLivePreview(source))
    await vi.advanceTimersByTimeAsync(200)
    expect(preview.value?.evaluation).toBeNull()
    expect(preview.value?.modes).toEqual([])
    expect(preview.value?.error?.message).toMatch(/cannot run the live preview/)
    const free = defaultDefinition().nodes.filter((n) => !n.fixed)
    expect(free.length).toBeGreaterThan(0)
    // the same nodes, in the same order, as the engine's own preview offers
    expect(preview.value?.nodeIds).toEqual(previewSizing(defaultDefinition(), inputFor()).nodeIds)
    expect(preview.value?.nodeIds).toEqual(free.map((n) => n.id))
  } finally {
    vi.useRealTimers()
  }
})

/**
 * A new sizing with the given choices, watched by useAutoChoices while the two-storey frame's
 * preview arrives; returns the node choices afterwards and the preview.
 */
async function choicesAfterPreview(choices: Partial<SizingForm>) {
  setActivePinia(createPinia())
  const store = useSizingDraftStore()
  store.open(newDraft(3, '2026-01-05T08:00:00.000Z'))
  store.setChoices(choices)
  const preview = ref<SizingPreview | null>(null)
  inComponent(() => useAutoChoices(preview))
  preview.value = previewSizing(twoStoreys(), inputFor())
  await nextTick()
  const f = store.current!.form
  return { nodes: [f.absorberNode, f.excitationNode, f.responseNode], preview: preview.value }
}

describe('the node choices kept valid as the structure changes', () => {
  beforeEach(() => localStorage.clear())

  it('attaches the absorber where the target mode moves most, the top of a two-storey frame', async () => {
    const { nodes, preview } = await choicesAfterPreview({})
    expect(nodes).toEqual(['level-2', 'level-2', 'level-2'])
    // First mode of two equal storeys on equal springs: φ = [1, (1+√5)/2], largest at the top
    // (two-storey shear frame, Chopra, Dynamics of Structures, ch. 10 (memory)).
    const shape = preview.modes[0]!.shape ?? []
    expect(Math.abs(shape[1]! / shape[0]!)).toBeCloseTo((1 + Math.sqrt(5)) / 2, 9)
  })

  it('replaces a node that no longer exists and leaves valid choices alone', async () => {
    const { nodes } = await choicesAfterPreview({
      absorberNode: 'level-1',
      excitationNode: 'gone',
      responseNode: 'level-1',
    })
    expect(nodes).toEqual(['level-1', 'level-2', 'level-1'])
  })
})
