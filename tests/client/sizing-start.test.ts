import { afterEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory, createRouter } from 'vue-router'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import { newDraft } from '../../src/features/sizing/draft'
import { startingSite, useSizingWorkspace } from '../../src/features/sizing/useSizingWorkspace'
import SizingUnopened from '../../src/features/sizing/components/SizingUnopened.vue'

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } })

const router = () =>
  createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/sizings/new/:step?', name: 'sizing-new', component: { render: () => null } },
      { path: '/sites', name: 'sites', component: { render: () => null } },
      { path: '/:any(.*)*', name: 'sign-in', component: { render: () => null } },
    ],
  })

/** The workspace composable on a page of its own, every request answered by `answer`. */
function workspace(answer: (path: string) => Response) {
  const requests: string[] = []
  vi.stubGlobal('fetch', async (path: string) => {
    requests.push(path)
    return answer(path)
  })
  let ws: ReturnType<typeof useSizingWorkspace> | undefined
  mount(
    defineComponent({
      setup() {
        ws = useSizingWorkspace()
        return () => h('div')
      },
    }),
    { global: { plugins: [createPinia(), router(), PrimeVue, ToastService] } },
  )
  return { ws: ws!, requests }
}

afterEach(() => vi.unstubAllGlobals())

describe('the site a new sizing starts from', () => {
  it('reads the address’s siteId as a site id only when it is one written plainly', () => {
    expect(startingSite('12')).toEqual({ siteId: 12 })
    for (const missing of [undefined, null, ''])
      expect(startingSite(missing)).toEqual({ why: expect.stringMatching(/starts from a site/) })
    // the ids the API refuses are refused here too (shared/schemas/ids.ts), never read as 1
    for (const mangled of ['abc', '1.5', '01', '-3', ' 1', '1e1'])
      expect(startingSite(mangled)).toEqual({
        why: expect.stringContaining(`"${mangled}" is not a site number`),
      })
    expect(startingSite(['4', '5'])).toEqual({ why: expect.stringContaining('"4, 5"') })
  })
})

describe('opening a new sizing from an address', () => {
  it('says the address names no site, asks the server nothing and stops waiting', async () => {
    const { ws, requests } = workspace(() => json(500, {}))
    await ws.load(null, 'abc')
    await flushPromises()
    expect(ws.loading.value).toBe(false)
    expect(ws.unopened.value).toMatch(/"abc" is not a site number.*starts from a site/)
    expect(ws.draft.value).toBeUndefined()
    expect(requests).toEqual([])
  })

  it("says in the server's words when the site does not exist or is not the engineer's to see", async () => {
    const refusal = 'The site does not exist or is not yours to see.'
    const { ws, requests } = workspace(() =>
      json(404, { error: { code: 'site-not-found', message: refusal } }),
    )
    await ws.load(null, '99999')
    await flushPromises()
    expect(requests).toEqual(['/api/sites/99999'])
    expect(ws.loading.value).toBe(false)
    expect(ws.unopened.value).toBe(refusal)
    expect(ws.draft.value).toBeUndefined()
  })
})

describe('a workspace address that opens nothing', () => {
  it('says why, links to the sites and offers the unsaved new sizings kept on this tablet', async () => {
    const r = router()
    const edited = { ...newDraft(3, '2026-11-30T09:00:00.000Z'), changed: true }
    edited.form.title = 'Bay C floor absorber'
    const untouched = newDraft(4, '2026-11-30T09:00:00.000Z')
    const wrapper = mount(SizingUnopened, {
      props: {
        why: 'A new sizing starts from a site: open the site, then start it there.',
        drafts: { [edited.key]: edited, [untouched.key]: untouched },
        step: 'target',
      },
      global: { plugins: [r, PrimeVue] },
    })
    await flushPromises()
    expect(wrapper.get('[role="alert"]').text()).toContain('A new sizing starts from a site')
    const links = wrapper.findAll('a').map((a) => [a.text(), a.attributes('href')])
    expect(links).toEqual([
      ['Go to the sites', '/sites'],
      ['Bay C floor absorber', '/sizings/new/target?siteId=3'],
    ])
  })

  it('lists nothing more when this tablet keeps no unsaved new sizing', () => {
    const wrapper = mount(SizingUnopened, {
      props: { why: 'The sizing does not exist or is not yours to see.', drafts: {} },
      global: { plugins: [router(), PrimeVue] },
    })
    expect(wrapper.text()).not.toContain('Unsaved new sizings')
    expect(wrapper.findAll('a')).toHaveLength(1)
  })
})
