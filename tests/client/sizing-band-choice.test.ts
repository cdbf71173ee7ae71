import { describe, expect, it } from 'vitest'
import { defineComponent, h, nextTick, ref } from 'vue'
import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import type { BandInput } from '../../shared/schemas/model'
import SizingBandChoice from '../../src/features/sizing/components/SizingBandChoice.vue'

/** The band choice bound with v-model to a value the test reads, as the target step binds it. */
function bandChoice(start?: BandInput) {
  const band = ref<BandInput | undefined>(start)
  const Host = defineComponent({
    setup: () => () =>
      h(SizingBandChoice, {
        modelValue: band.value,
        'onUpdate:modelValue': (v: BandInput | undefined) => (band.value = v),
        current: { minHz: 4.2, maxHz: 7.9 },
        disabled: false,
      }),
  })
  const wrapper = mount(Host, { global: { plugins: [PrimeVue] }, attachTo: document.body })
  return { wrapper, band }
}

const button = (w: ReturnType<typeof bandChoice>['wrapper'], text: string) =>
  w.findAll('button').find((b) => b.text() === text)!

describe('the frequency band choice of the target step', () => {
  it('starts a band the engineer sets from the band the engine uses now', async () => {
    const { wrapper, band } = bandChoice()
    expect(wrapper.find('#band-min').exists()).toBe(false)
    await button(wrapper, 'Set the band').trigger('click')
    expect(band.value).toEqual({ minHz: 4.2, maxHz: 7.9 })
    await nextTick()
    expect(wrapper.find('#band-min').exists()).toBe(true)
  })

  it('changes one edge as typed and keeps the other', async () => {
    const { wrapper, band } = bandChoice({ minHz: 4, maxHz: 8 })
    const max = wrapper.get('#band-max')
    await max.setValue('9,5')
    await max.trigger('blur')
    expect(band.value).toEqual({ minHz: 4, maxHz: 9.5 })
  })

  it('goes back to the band around the target mode', async () => {
    const { wrapper, band } = bandChoice({ minHz: 4, maxHz: 8 })
    await button(wrapper, 'Around the target mode').trigger('click')
    expect(band.value).toBeUndefined()
  })
})
