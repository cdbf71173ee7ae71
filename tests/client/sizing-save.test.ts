import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { defineComponent, h, nextTick } from 'vue'
import { flushPromises, mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory, createRouter } from 'vue-router'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import type { SizingInput } from '../../shared/schemas/sizing'
import { newDraft, type SizingDraft } from '../../src/features/sizing/draft'
import { useSizingDraftStore } from '../../src/features/sizing/draft-store'
import { useSizingSave } from '../../src/features/sizing/useSizingSave'
import { useSizingWorkspace } from '../../src/features/sizing/useSizingWorkspace'
import { provideFormErrors } from '../../src/forms/form-errors'

interface Sent {
  method: string
  path: string
  body: { baseRevision?: number; input?: SizingInput } | null
}

/** The server as the browser sees it: each request is answered by `answer`, or fails offline. */
function server(answer: (r: Sent) => { status: number; body: unknown } | 'offline') {
  const sent: Sent[] = []
  vi.stubGlobal('fetch', async (path: string, init: RequestInit) => {
    const r = {
      method: init.method ?? 'GET',
      path,
      body: init.body ? JSON.parse(String(init.body)) : null,
    }
    sent.push(r)
    const a = answer(r)
    if (a === 'offline') throw new TypeError('Failed to fetch')
    return new Response(JSON.stringify(a.body), {
      status: a.status,
      headers: { 'content-type': 'application/json' },
    })
  })
  return sent
}

/** A saved sizing (id 9, revision 2) on a saved model, open in the workspace with one edit. */
function openSaved(sizingId: number | null = 9) {
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [{ path: '/:any(.*)*', name: 'sign-in', component: { render: () => null } }],
  })
  let out: { saving: ReturnType<typeof useSizingSave>; draft: () => SizingDraft } | undefined
  mount(
    defineComponent({
      setup() {
        const store = useSizingDraftStore()
        const fresh = newDraft(3, '2026-01-05T08:00:00.000Z')
        Object.assign(fresh, {
          key: sizingId ? `sizing-${sizingId}` : fresh.key,
          sizingId,
          sizingRevision: sizingId ? 2 : null,
          modelId: 5,
          modelRevision: 1,
          structureChanged: false,
        })
        Object.assign(fresh.form, {
          absorberNode: 'host',
          excitationNode: 'host',
          responseNode: 'host',
        })
        store.open(fresh)
        store.setChoices({ massRatio: 0.03 })
        const ws = useSizingWorkspace()
        out = { saving: useSizingSave(ws, provideFormErrors()), draft: () => store.current! }
        return () => h('div')
      },
    }),
    { global: { plugins: [createPinia(), router, PrimeVue, ToastService] } },
  )
  return out!
}

const view = (id: number, revision: number, input: SizingInput) => ({
  id,
  siteId: 3,
  modelId: 5,
  ownerId: 1,
  ownerName: 'Engineer',
  title: input.title,
  state: 'draft',
  currentRevision: revision,
  revision,
  submittedAt: null,
  handoverNote: '',
  updatedAt: '2026-01-05T09:00:00.000Z',
  input,
})

beforeEach(() => localStorage.clear())
afterEach(() => vi.unstubAllGlobals())

describe('saving a sizing from the tablet', () => {
  it('keeps a save made without a connection and sends it once the browser is back online', async () => {
    let online = false
    const sent = server((r) =>
      online ? { status: 200, body: view(9, 3, r.body!.input!) } : 'offline',
    )
    const { saving, draft } = openSaved()
    expect(await saving.save()).toBe(false)
    expect(draft().pendingSync).toBe(true)
    expect(draft().changed).toBe(true)

    online = true
    window.dispatchEvent(new Event('offline'))
    await nextTick()
    window.dispatchEvent(new Event('online'))
    await flushPromises()
    expect(sent.map((s) => `${s.method} ${s.path} from ${s.body?.baseRevision}`)).toEqual([
      'PUT /api/sizings/9 from 2',
      'PUT /api/sizings/9 from 2',
    ])
    expect(sent[1]!.body!.input!.massRatio).toBe(0.03)
    expect(draft()).toMatchObject({ changed: false, pendingSync: false, sizingRevision: 3 })
  })

  it('sends nothing over a newer revision on the server and says what differs', async () => {
    const sent = server((r) => {
      if (r.method === 'PUT')
        return { status: 409, body: { error: { code: 'revision-conflict', message: 'Newer' } } }
      // a colleague saved revision 4 with another mass ratio meanwhile
      const mine = sent[0]!.body!.input!
      return { status: 200, body: view(9, 4, { ...mine, massRatio: 0.05 }) }
    })
    const { saving, draft } = openSaved()
    expect(await saving.save()).toBe(false)
    expect(sent.map((s) => s.method)).toEqual(['PUT', 'GET'])
    expect(saving.conflict.value).toMatchObject({ kind: 'sizing', serverRevision: 4 })
    expect(saving.conflict.value?.differences).toContain('Mass ratio')
    expect(draft().changed).toBe(true)
  })

  it('gives a new sizing the id the server made and keeps its draft under that id', async () => {
    server((r) => ({ status: 201, body: view(12, 1, r.body!.input!) }))
    const { saving, draft } = openSaved(null)
    expect(await saving.save()).toBe(true)
    expect(draft()).toMatchObject({ key: 'sizing-12', sizingId: 12, changed: false })
  })
})
