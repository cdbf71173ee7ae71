import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory, createRouter } from 'vue-router'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import { newDraft } from '../../src/features/sizing/draft'
import { useSizingDraftStore } from '../../src/features/sizing/draft-store'
import { useSizingWorkspace } from '../../src/features/sizing/useSizingWorkspace'
import SizingRecordLinks from '../../src/features/sizing/components/SizingRecordLinks.vue'

/** The workspace composable with one sizing already open, and every request answered 404. */
function workspaceAfterAnother() {
  vi.stubGlobal(
    'fetch',
    async () =>
      new Response(JSON.stringify({ error: { code: 'not-found', message: 'No such sizing.' } }), {
        status: 404,
        headers: { 'content-type': 'application/json' },
      }),
  )
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [{ path: '/:any(.*)*', name: 'sign-in', component: { render: () => null } }],
  })
  let ws: ReturnType<typeof useSizingWorkspace> | undefined
  mount(
    defineComponent({
      setup() {
        useSizingDraftStore().open(newDraft(3, '2026-01-05T08:00:00.000Z'))
        ws = useSizingWorkspace()
        return () => h('div')
      },
    }),
    { global: { plugins: [createPinia(), router, PrimeVue, ToastService] } },
  )
  return ws!
}

afterEach(() => vi.unstubAllGlobals())

describe('opening a sizing in the workspace', () => {
  it('says a new sizing starts from a site when the address names none, and shows no other sizing', async () => {
    const ws = workspaceAfterAnother()
    expect(ws.draft.value).toBeDefined()
    await ws.load(null, null)
    await flushPromises()
    expect(ws.loading.value).toBe(false)
    expect(ws.unopened.value).toMatch(/starts from a site/)
    expect(ws.draft.value).toBeUndefined()
  })

  it("says why a sizing could not be opened, in the server's words, instead of loading forever", async () => {
    const ws = workspaceAfterAnother()
    await ws.load(41, null)
    await flushPromises()
    expect(ws.loading.value).toBe(false)
    expect(ws.unopened.value).toBe('No such sizing.')
    expect(ws.draft.value).toBeUndefined()
  })
})

describe("a sizing's linked records", () => {
  it("says when a linked record's peaks could not be read, instead of showing nothing", async () => {
    const summary = {
      id: 7,
      filename: 'bay-c-heel-drop.csv',
      kind: 'heel drop',
      peakCount: 2,
      createdAt: '2026-11-30T09:00:00.000Z',
    }
    vi.stubGlobal('fetch', async (path: string) =>
      path.endsWith('/records')
        ? new Response(JSON.stringify([summary]), {
            status: 200,
            headers: { 'content-type': 'application/json' },
          })
        : new Response(
            JSON.stringify({ error: { code: 'unavailable', message: 'Database unavailable.' } }),
            { status: 503, headers: { 'content-type': 'application/json' } },
          ),
    )
    const wrapper = mount(SizingRecordLinks, {
      props: { modelValue: [{ recordId: 7, peaks: [] }], siteId: 3, modes: [], disabled: false },
      global: {
        plugins: [
          createPinia(),
          createRouter({
            history: createMemoryHistory(),
            routes: [{ path: '/:any(.*)*', component: { render: () => null } }],
          }),
          PrimeVue,
          ToastService,
        ],
      },
    })
    await flushPromises()
    expect(wrapper.text()).toContain('bay-c-heel-drop.csv')
    expect(wrapper.text()).toContain("Could not read this record's peaks: Database unavailable.")
  })
})
