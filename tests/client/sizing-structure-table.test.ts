import { beforeEach, describe, expect, it } from 'vitest'
import { defineComponent, h } from 'vue'
import { mount } from '@vue/test-utils'
import PrimeVue from 'primevue/config'
import { provideFormErrors } from '../../src/forms/form-errors'
import { openNewDraft } from '../helpers/sizing-draft'
import SizingWorkspaceStructureTable from '../../src/features/sizing/components/SizingWorkspaceStructureTable.vue'

const SpringEnd = { render: () => h('span') }

/** The structure tables of a fresh draft, as the structure step shows them. */
function tables(readOnly = false) {
  const { pinia, store } = openNewDraft(52, 4)
  const selected: string[] = []
  const Host = defineComponent({
    setup() {
      provideFormErrors()
      return () =>
        h(SizingWorkspaceStructureTable, {
          definition: store.current!.definition,
          selected: null,
          readOnly,
          onSelect: (id: string) => selected.push(id),
        })
    },
  })
  // jsdom has no matchMedia, which PrimeVue's drop-down needs: the spring ends are stubbed
  const wrapper = mount(Host, {
    global: { plugins: [PrimeVue, pinia], stubs: { Select: SpringEnd } },
    attachTo: document.body,
  })
  return { wrapper, store, selected, definition: () => store.current!.definition }
}

type Wrapper = ReturnType<typeof tables>['wrapper']
const byLabel = (w: Wrapper, label: string) => w.get(`[aria-label="${label}"]`)
/** The input of a quantity cell, found by its (visually hidden) label. */
const field = (w: Wrapper, label: string) =>
  w.get(
    `#${w
      .findAll('label')
      .find((l) => l.text() === label)!
      .attributes('for')}`,
  )

beforeEach(() => localStorage.clear())

describe('the structure tables of the sizing workspace', () => {
  it('writes a typed node mass and a cleared dashpot into the draft, marking it unsaved', async () => {
    const { wrapper, definition, store } = tables()
    const i = definition().nodes.findIndex((n) => !n.fixed)
    const mass = field(wrapper, `Mass of ${definition().nodes[i]!.id}`)
    // a decimal comma and a unit are read as typed (conventions of the quantity fields)
    await mass.setValue('2,5 t')
    await mass.trigger('blur')
    expect(definition().nodes[i]!.mass).toBe(2500)
    expect(store.current!.changed).toBe(true)

    const dashpot = field(wrapper, 'Dashpot of spring 1')
    await dashpot.setValue('1500')
    await dashpot.trigger('blur')
    expect(definition().springs[0]!.damping).toBe(1500)
    await dashpot.setValue('')
    await dashpot.trigger('blur')
    expect(definition().springs[0]).not.toHaveProperty('damping')
  })

  it('renames a node and every spring end that named it, and selects it', async () => {
    const { wrapper, definition, selected } = tables()
    const old = definition().nodes[0]!.id
    const id = byLabel(wrapper, 'Id of node 1')
    await id.setValue('ground-slab')
    await id.trigger('change')
    expect(definition().nodes[0]!.id).toBe('ground-slab')
    const ends = definition().springs.flatMap((s) => [s.from, s.to])
    expect(ends).not.toContain(old)
    expect(ends).toContain('ground-slab')
    expect(selected.at(-1)).toBe('ground-slab')
  })

  it('adds a node hung on a spring from the last one, then removes it with its springs', async () => {
    const { wrapper, definition, selected } = tables()
    const nodes = definition().nodes.length
    const springs = definition().springs.length
    await wrapper
      .findAll('button')
      .find((b) => b.text() === 'Add node')!
      .trigger('click')
    const added = definition().nodes.at(-1)!.id
    expect(definition().nodes).toHaveLength(nodes + 1)
    expect(definition().springs).toHaveLength(springs + 1)
    expect(selected.at(-1)).toBe(added)
    await byLabel(wrapper, `Remove node ${added}`).trigger('click')
    expect(definition().nodes).toHaveLength(nodes)
    expect(definition().springs).toHaveLength(springs)
  })

  it('shows no add or remove buttons and disables the fields on a read-only sizing', async () => {
    const { wrapper } = tables(true)
    expect(wrapper.findAll('button')).toHaveLength(0)
    expect(byLabel(wrapper, 'Id of node 1').attributes('disabled')).toBeDefined()
  })
})
