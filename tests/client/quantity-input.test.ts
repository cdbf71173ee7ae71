import { describe, expect, it } from 'vitest'
import { defineComponent, h, ref } from 'vue'
import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import QuantityInput from '../../src/components/QuantityInput.vue'
import { provideFormErrors } from '../../src/forms/form-errors'
import type { FieldKind } from '../../shared/field-text'
import type { Currency } from '../../shared/money'

interface Props {
  kind: FieldKind
  label?: string
  currency?: Currency
  range?: readonly [number, number]
  step?: number
  path?: string
}

/** A field inside a form, bound to a value the test can read, as a parent would bind it. */
function field(props: Props, start?: number) {
  const value = ref<number | undefined>(start)
  let form: ReturnType<typeof provideFormErrors> | undefined
  const Host = defineComponent({
    setup() {
      form = provideFormErrors()
      return () =>
        h(QuantityInput, {
          label: 'Field',
          ...props,
          modelValue: value.value,
          'onUpdate:modelValue': (v: number) => (value.value = v),
          onClear: () => (value.value = undefined),
        })
    },
  })
  const wrapper = mount(Host, { global: { plugins: [PrimeVue] }, attachTo: document.body })
  const input = wrapper.get('input')
  return { wrapper, input, value, form: () => form! }
}

/** Types one character at a time, as a person does, with an input event after each. */
async function typeSlowly(input: ReturnType<typeof field>['input'], text: string) {
  await input.trigger('focus')
  await input.setValue('')
  let typed = ''
  for (const ch of text) {
    typed += ch
    await input.setValue(typed)
    await new Promise((r) => setTimeout(r, 5))
    expect((input.element as HTMLInputElement).value).toBe(typed)
  }
}

const note = (w: ReturnType<typeof field>['wrapper']) => w.get('.note').text()

describe('the one quantity input of every numeric field', () => {
  it('never rewrites the text while the person types, and takes no value until they commit', async () => {
    const f = field({ kind: 'percent' }, 0.02)
    await typeSlowly(f.input, '5 %')
    await new Promise((r) => setTimeout(r, 400)) // longer than any debounce the app uses
    expect((f.input.element as HTMLInputElement).value).toBe('5 %')
    expect(f.value.value).toBe(0.02)
    await f.input.trigger('blur')
    expect(f.value.value).toBeCloseTo(0.05, 15)
    expect((f.input.element as HTMLInputElement).value).toBe('5 %')
  })

  it('reads a bare number in a percentage field as a percentage, and says so', async () => {
    const f = field({ kind: 'percent' })
    await typeSlowly(f.input, '5')
    await f.input.trigger('keydown', { key: 'Enter' })
    expect(f.value.value).toBeCloseTo(0.05, 15)
    expect(note(f.wrapper)).toContain('= 5 %')
    expect(note(f.wrapper)).toContain('5 means 5 %')
    await typeSlowly(f.input, '0,05')
    await f.input.trigger('blur')
    expect(f.value.value).toBeCloseTo(0.0005, 15)
    expect(note(f.wrapper)).toContain('= 0.05 %')
  })

  it('reads a decimal comma and units and shows the value it understood', async () => {
    const f = field({ kind: 'frequency' })
    await typeSlowly(f.input, '6,3 Hz')
    await f.input.trigger('blur')
    expect(f.value.value).toBe(6.3)
    expect(note(f.wrapper)).toContain('= 6.3 Hz')
    const k = field({ kind: 'stiffness' })
    await typeSlowly(k.input, '35 kN/mm')
    await k.input.trigger('blur')
    expect(k.value.value).toBeCloseTo(3.5e7, 6)
  })

  it('reads money with a decimal comma in minor units, never ten times the amount', async () => {
    const f = field({ kind: 'money', currency: 'EUR' })
    await typeSlowly(f.input, '12,5')
    await f.input.trigger('blur')
    expect(f.value.value).toBe(1250)
    expect(note(f.wrapper)).toContain('= €12.50')
  })

  it('warns outside the plausible range and keeps the value, never clamping it', async () => {
    const f = field({ kind: 'percent', range: [0.001, 0.5] }, 0.02)
    await typeSlowly(f.input, '60')
    await f.input.trigger('blur')
    expect(f.value.value).toBeCloseTo(0.6, 15)
    expect((f.input.element as HTMLInputElement).value).toBe('60')
    expect(note(f.wrapper)).toContain('plausible range is 0.1 % to 50 %')
  })

  it('keeps an unreadable text with its reason, keeps the old value and blocks the form', async () => {
    const f = field({ kind: 'mass', label: 'Mass of n1' }, 1000)
    await typeSlowly(f.input, '12 Hz')
    await f.input.trigger('blur')
    expect(f.value.value).toBe(1000)
    expect((f.input.element as HTMLInputElement).value).toBe('12 Hz')
    expect(note(f.wrapper)).toContain('"Hz" is not a unit of mass')
    expect(f.form().blocking.value).toBe('Mass of n1: "Hz" is not a unit of mass (e.g. kg)')
    await typeSlowly(f.input, '12 t')
    await f.input.trigger('blur')
    expect(f.value.value).toBe(12000)
    expect(f.form().blocking.value).toBe('')
  })

  it('shows a new value from elsewhere when the person is not typing in it', async () => {
    const f = field({ kind: 'mass' }, 1000)
    f.value.value = 2500
    await f.wrapper.vm.$nextTick()
    expect((f.input.element as HTMLInputElement).value).toBe('2500 kg')
  })

  it('steps a whole number with the arrow keys', async () => {
    const f = field({ kind: 'count', step: 1 }, 3)
    await f.input.trigger('keydown', { key: 'ArrowUp' })
    expect(f.value.value).toBe(4)
    expect((f.input.element as HTMLInputElement).value).toBe('4')
  })

  it('shows the form’s message for its path beside it', async () => {
    const f = field({ kind: 'percent', path: 'input.massRatio' }, 0.6)
    f.form().errors.value = { 'input.massRatio': 'at most 50 %' }
    await f.wrapper.vm.$nextTick()
    expect(note(f.wrapper)).toContain('at most 50 %')
  })
})
