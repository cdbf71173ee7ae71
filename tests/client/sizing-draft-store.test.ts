import { beforeEach, describe, expect, it } from 'vitest'
import { nextTick } from 'vue'
import { newDraft } from '../../src/features/sizing/draft'
import { openNewDraft } from '../helpers/sizing-draft'

/** A fresh app state signed in as the given user, with the draft of a new sizing open. */
const signedIn = (userId: number) => openNewDraft(userId, 7).store

const kept = (userId: number) =>
  JSON.parse(localStorage.getItem(`quellnode.sizingDrafts.${userId}`) ?? '{}') as Record<
    string,
    { form: { massRatio: number } }
  >

beforeEach(() => localStorage.clear())

describe('the sizing draft store', () => {
  it('marks a draft unsaved after an edit and keeps it in this browser under its user', async () => {
    const store = signedIn(41)
    expect(store.state).toBe('saved')
    store.setChoices({ massRatio: 0.035 })
    expect(store.current?.form.massRatio).toBe(0.035)
    expect(store.state).toBe('unsaved')
    await nextTick()
    expect(kept(41)['new-site-7']?.form.massRatio).toBe(0.035)
    expect(kept(42)).toEqual({})
  })

  it('ignores edits of a read-only sizing', () => {
    const store = signedIn(41)
    store.locked = true
    store.setChoices({ title: 'Changed' })
    store.addNode()
    expect(store.current?.form.title).toBe('')
    expect(store.current?.definition.nodes).toHaveLength(2)
    expect(store.current?.changed).toBe(false)
  })

  it('keeps the unsaved copy on this tablet when the server copy is opened again', () => {
    const store = signedIn(41)
    store.setChoices({ title: 'Level 4 bay C' })
    const reopened = store.open(newDraft(7, '2026-01-05T09:00:00.000Z'))
    expect(reopened.form.title).toBe('Level 4 bay C')
  })

  it('renames a node together with the springs that end at it', () => {
    const store = signedIn(41)
    const old = store.current!.definition.nodes[1]!.id
    store.renameNode(1, 'deck')
    const def = store.current!.definition
    expect(def.nodes[1]?.id).toBe('deck')
    expect(def.springs.some((s) => s.to === old || s.from === old)).toBe(false)
    expect(def.springs.some((s) => s.to === 'deck' || s.from === 'deck')).toBe(true)
    expect(store.current!.structureChanged).toBe(true)
  })

  it('adds a node on a spring from the last one and removes it with its springs', () => {
    const store = signedIn(41)
    const springs = store.current!.definition.springs.length
    const id = store.addNode()
    expect(store.current!.definition.springs).toHaveLength(springs + 1)
    store.removeNode(id)
    expect(store.current!.definition.nodes.map((n) => n.id)).not.toContain(id)
    expect(store.current!.definition.springs).toHaveLength(springs)
  })

  it('removes a dashpot that is cleared instead of keeping an empty value', () => {
    const store = signedIn(41)
    store.setSpring(0, { damping: 1200 })
    expect(store.current!.definition.springs[0]?.damping).toBe(1200)
    store.setSpring(0, { damping: undefined })
    expect('damping' in store.current!.definition.springs[0]!).toBe(false)
  })

  it('attaches the absorber at a node and fills the empty excitation and response nodes', () => {
    const store = signedIn(41)
    store.setChoices({ responseNode: 'elsewhere' })
    store.attachAt('floor')
    const f = store.current!.form
    expect([f.absorberNode, f.excitationNode, f.responseNode]).toEqual([
      'floor',
      'floor',
      'elsewhere',
    ])
  })

  it('says offline for unsaved edits while the browser has no connection', async () => {
    const store = signedIn(41)
    store.setChoices({ massRatio: 0.03 })
    window.dispatchEvent(new Event('offline'))
    await nextTick()
    expect(store.state).toBe('offline')
    window.dispatchEvent(new Event('online'))
    await nextTick()
    expect(store.state).toBe('unsaved')
  })

  it('moves a new sizing’s draft to its saved id', () => {
    const store = signedIn(41)
    store.rekey('new-site-7', 'sizing-90')
    expect(store.currentKey).toBe('sizing-90')
    expect(store.current?.key).toBe('sizing-90')
    expect(store.drafts['new-site-7']).toBeUndefined()
  })
})
