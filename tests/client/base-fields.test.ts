import { describe, expect, it } from 'vitest'
import { defineComponent, h, nextTick, ref } from 'vue'
import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { z } from 'zod'
import BaseSelectField from '../../src/components/BaseSelectField.vue'
import BaseTextField from '../../src/components/BaseTextField.vue'
import { provideFormErrors } from '../../src/forms/form-errors'
import { choicesByName, choicesOf } from '../../src/forms/choices'

// jsdom has no media queries; PrimeVue's drop-down asks one as it mounts
window.matchMedia ??= ((query: string) =>
  ({
    matches: false,
    media: query,
    addEventListener: () => {},
    removeEventListener: () => {},
  }) as unknown as MediaQueryList) as typeof window.matchMedia

const Schema = z.object({ name: z.string().min(1, 'required'), companyId: z.number().positive() })

/** A name field and a company choice in one form, as a dialog lays them out. */
function form() {
  const value = ref({ name: '', companyId: 0 })
  let errors: ReturnType<typeof provideFormErrors> | undefined
  const Host = defineComponent({
    setup() {
      errors = provideFormErrors()
      return () => [
        h(BaseTextField, {
          inputId: 'f-name',
          label: 'Name',
          path: 'name',
          placeholder: 'Company name',
          modelValue: value.value.name,
          'onUpdate:modelValue': (v: string) => (value.value.name = v),
        }),
        h(BaseSelectField, {
          inputId: 'f-company',
          label: 'Customer',
          path: 'companyId',
          options: choicesByName([{ id: 7, name: 'Harbour Works' }]),
          modelValue: value.value.companyId,
        }),
      ]
    },
  })
  const wrapper = mount(Host, { global: { plugins: [PrimeVue] }, attachTo: document.body })
  return { wrapper, value, errors: () => errors! }
}

describe('labelled form fields', () => {
  it('label their input, pass attributes to it and keep the typed text', async () => {
    const f = form()
    const input = f.wrapper.get('#f-name')
    expect(f.wrapper.get('label[for="f-name"]').text()).toBe('Name')
    expect(input.attributes('placeholder')).toBe('Company name')
    await input.setValue('Harbour Works ')
    expect(f.value.value.name).toBe('Harbour Works ')
    f.wrapper.unmount()
  })

  it('show the message of their own path under the field once the schema refuses the form', async () => {
    const f = form()
    expect(f.wrapper.findAll('[role="alert"]')).toHaveLength(0)
    expect(f.errors().check(Schema, f.value.value)).toBe(false)
    await nextTick()
    const messages = f.wrapper.findAll('[role="alert"]').map((m) => m.text())
    expect(messages).toHaveLength(2)
    expect(f.wrapper.get('#f-name').attributes('aria-invalid')).toBe('true')
    f.wrapper.unmount()
  })
})

describe('choices', () => {
  it('show fixed values in words and named records by name, choosing the value or the id', () => {
    expect(choicesOf(['floor', 'foot-bridge'] as const, (k) => k.replace('-', ' '))).toEqual([
      { label: 'floor', value: 'floor' },
      { label: 'foot bridge', value: 'foot-bridge' },
    ])
    expect(choicesByName([{ id: 3, name: 'Quay 4' }])).toEqual([{ label: 'Quay 4', value: 3 }])
  })
})
