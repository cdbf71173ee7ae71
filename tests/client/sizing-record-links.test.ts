import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory, createRouter } from 'vue-router'
import PrimeVue from 'primevue/config'
import Toast from 'primevue/toast'
import ToastService from 'primevue/toastservice'
import SizingRecordLinks from '../../src/features/sizing/components/SizingRecordLinks.vue'

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })

const unavailable = () =>
  json(503, { error: { code: 'unavailable', message: 'Database unavailable.' } })

const record = {
  id: 7,
  filename: 'bay-d-heel-drop.csv',
  kind: 'heel drop',
  peakCount: 2,
  createdAt: '2026-11-30T09:00:00.000Z',
}

/** The record links of site 3 with the app's toasts, every request answered by `answer`. */
function linksOfSite(answer: (path: string) => Response | Promise<Response>) {
  vi.stubGlobal('fetch', async (path: string) => answer(path))
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [{ path: '/:any(.*)*', name: 'sign-in', component: { render: () => null } }],
  })
  return mount(
    defineComponent({
      setup: () => () => [
        h(Toast),
        h(SizingRecordLinks, { modelValue: [], siteId: 3, modes: [], disabled: false }),
      ],
    }),
    {
      attachTo: document.body,
      global: { plugins: [createPinia(), router, PrimeVue, ToastService] },
    },
  )
}

afterEach(() => {
  vi.unstubAllGlobals()
  document.body.innerHTML = ''
})

describe("a sizing's site records", () => {
  it('says the records could not be loaded, with the reason, where the list would be and in a toast', async () => {
    const wrapper = linksOfSite(unavailable)
    await flushPromises()
    const section = wrapper.get('section[aria-label="Linked records"]')
    expect(section.text()).toContain('Could not load the site records: Database unavailable.')
    // a failed load must never read as an empty list (DEVELOPERS.md, "Submitting and loading")
    expect(section.text()).not.toContain('No records yet')
    expect(document.body.textContent).toContain('Could not load the site records')
    wrapper.unmount()
  })

  it('loads the records again when asked after a failed load', async () => {
    let fail = true
    const wrapper = linksOfSite((path) =>
      fail ? unavailable() : json(200, path.endsWith('/api/sites/3/records') ? [record] : []),
    )
    await flushPromises()
    fail = false
    await wrapper.get('.problem button').trigger('click')
    await flushPromises()
    const section = wrapper.get('section[aria-label="Linked records"]')
    expect(section.text()).toContain('bay-d-heel-drop.csv')
    expect(section.text()).not.toContain('Could not load')
    wrapper.unmount()
  })

  it('says it is loading, not that there are no records, until the server answers', async () => {
    let answer = (_: Response) => {}
    const wrapper = linksOfSite(() => new Promise<Response>((r) => (answer = r)))
    await flushPromises()
    const section = () => wrapper.get('section[aria-label="Linked records"]').text()
    expect(section()).toContain('Loading the site records')
    expect(section()).not.toContain('No records yet')
    answer(json(200, []))
    await flushPromises()
    expect(section()).toContain('No records yet')
    wrapper.unmount()
  })
})
