import { beforeEach, describe, expect, it } from 'vitest'
import { defineComponent, h } from 'vue'
import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import type { SetUnitReport } from '../../shared/dynamics/multi'
import type { SizingUnit } from '../../shared/schemas/sizing-units'
import { provideFormErrors } from '../../src/forms/form-errors'
import { openNewDraft } from '../helpers/sizing-draft'
import SizingUnitsEditorRow from '../../src/features/sizing/components/SizingUnitsEditorRow.vue'

/** A drop-down stand-in (jsdom has no matchMedia for PrimeVue's): it shows its id and value. */
const Choice = defineComponent({
  props: {
    inputId: { type: String, default: '' },
    modelValue: { type: [String, Number], default: '' },
  },
  emits: ['update:modelValue'],
  setup: (props) => () => h('span', { id: props.inputId }, String(props.modelValue)),
})

/** The preview's figures for the unit: 180.4 kg, 1.83 % of 9858 kg. */
const sized = {
  mass: 180.4,
  massRatio: 0.0183,
  effectiveMass: 9858,
  frequencyHz: 4.512,
  dampingRatio: 0.061,
} as SetUnitReport

/** The first further absorber of a fresh draft, as the absorber step shows it. */
function row(unit: SizingUnit) {
  const { pinia, store } = openNewDraft(53, 5)
  store.setChoices({ absorbers: [unit] })
  const Host = {
    setup() {
      provideFormErrors()
      return () =>
        h(SizingUnitsEditorRow, {
          unit: store.current!.form.absorbers![0]!,
          index: 0,
          nodeIds: ['node-1', 'node-2'],
          modes: [],
          sized,
          disabled: false,
        })
    },
  }
  const wrapper = mount(Host, {
    global: { plugins: [PrimeVue, pinia], stubs: { BaseSelect: Choice } },
    attachTo: document.body,
  })
  /** the drop-down of the field with this id */
  const choice = (id: string) =>
    wrapper.findAllComponents(Choice).find((c) => c.props('inputId') === id)!
  return { wrapper, choice, unit: () => store.current!.form.absorbers![0] }
}

beforeEach(() => localStorage.clear())

describe('a further absorber of the absorber step', () => {
  it('keeps the size when its mass is given in kg instead of as a ratio, and back', async () => {
    const { choice, unit, wrapper } = row({ node: 'node-2', targetMode: 2, massRatio: 0.02 })
    choice('unit-2-mass-way').vm.$emit('update:modelValue', 'mass')
    await wrapper.vm.$nextTick()
    // the mass the preview gives now, rounded to a kg
    expect(unit()).toEqual({ node: 'node-2', targetMode: 2, mass: 180 })
    expect(wrapper.find('#unit-2-mass').exists()).toBe(true)
    choice('unit-2-mass-way').vm.$emit('update:modelValue', 'ratio')
    expect(unit()).toEqual({ node: 'node-2', targetMode: 2, massRatio: 0.0183 })
  })

  it('takes a mass ratio as typed, in %, and the node and mode chosen', async () => {
    const { choice, unit, wrapper } = row({ node: 'node-2', targetMode: 2, massRatio: 0.02 })
    const ratio = wrapper.get('#unit-2-ratio')
    await ratio.setValue('1,5')
    await ratio.trigger('blur')
    choice('unit-2-node').vm.$emit('update:modelValue', 'node-1')
    choice('unit-2-mode').vm.$emit('update:modelValue', 3)
    expect(unit()).toEqual({ node: 'node-1', targetMode: 3, massRatio: 0.015 })
  })

  it('sends the optimiser as no tuning at all, and shows a tuning given as numbers as it is', async () => {
    const optimised = row({ node: 'node-2', targetMode: 2, massRatio: 0.02, tuning: 'den-hartog' })
    optimised.choice('unit-2-tuning').vm.$emit('update:modelValue', 'optimize')
    expect(optimised.unit()).not.toHaveProperty('tuning')

    const given = { frequencyRatio: 0.97, dampingRatio: 0.08 }
    const { wrapper } = row({ node: 'node-2', targetMode: 2, massRatio: 0.02, tuning: given })
    expect(wrapper.text()).toContain('Tuning given: f = 0.97')
    expect(wrapper.find('#unit-2-tuning').exists()).toBe(false)
  })
})
