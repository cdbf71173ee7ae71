import { afterEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory, createRouter } from 'vue-router'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import SiteRecordsView from '../../src/views/SiteRecordsView.vue'

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })

const site = { id: 3, name: 'Bay D mezzanine' }

/** The measurements page of site 3, the site and models answered, the records by `records`. */
function pageOfSite(records: () => Response) {
  vi.stubGlobal('fetch', async (path: string) =>
    path.includes('/records') ? records() : json(200, path.includes('/models') ? [] : site),
  )
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [{ path: '/:any(.*)*', name: 'sign-in', component: { render: () => null } }],
  })
  return mount(SiteRecordsView, {
    props: { id: '3' },
    global: {
      plugins: [createPinia(), router, PrimeVue, ToastService],
      stubs: { RecordUploadForm: true, RecordDetail: true },
    },
  })
}

afterEach(() => vi.unstubAllGlobals())

describe("a site's measurements page", () => {
  it('says the records could not be loaded, never that there are none, and loads them on a retry', async () => {
    let answer = () =>
      json(503, { error: { code: 'unavailable', message: 'Database unavailable.' } })
    const page = pageOfSite(() => answer())
    await flushPromises()
    expect(page.get('[role="alert"]').text()).toContain(
      'Could not load the records: Database unavailable.',
    )
    expect(page.text()).not.toContain('No records yet')
    answer = () => json(200, [])
    await page.get('[role="alert"] button').trigger('click')
    await flushPromises()
    expect(page.find('[role="alert"]').exists()).toBe(false)
    expect(page.text()).toContain('No records yet.')
  })
})
