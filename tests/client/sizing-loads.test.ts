import { describe, expect, it } from 'vitest'
import { SizingInputSchema } from '../../shared/schemas/sizing'
import { chooseLoad, loadChoiceOf, setSpeed, type KeptLoad } from '../../src/features/sizing/loads'
import { defaultForm, toSizingInput, type SizingDraft } from '../../src/features/sizing/draft'

function draft(): SizingDraft {
  const form = { ...defaultForm(), absorberNode: 'n2', excitationNode: 'n2', responseNode: 'n2' }
  return {
    key: 'k',
    siteId: 1,
    sizingId: null,
    sizingRevision: null,
    modelId: 1,
    modelRevision: 1,
    modelName: '',
    definition: { nodes: [], springs: [], hostDampingRatio: 0.02 },
    structureChanged: false,
    revisionReason: '',
    form,
    changed: false,
    pendingSync: false,
    updatedAt: '',
  }
}

/** What the form would send must pass the API's own schema (it refuses other kinds' fields). */
const sent = (d: SizingDraft) => SizingInputSchema.safeParse(toSizingInput(d))

describe('switching the kind of design load', () => {
  it('sends only the fields of the chosen kind, each time accepted by the API schema', () => {
    const d = draft()
    const kept: KeptLoad = {}
    for (const choice of ['machine', 'base', 'mode-shaped', 'forces', 'force'] as const) {
      chooseLoad(d.form, choice, kept)
      expect(loadChoiceOf(d.form), choice).toBe(choice)
      const r = sent(d)
      expect(r.error?.issues ?? [], choice).toEqual([])
    }
  })

  it('keeps what was typed for a kind while another is chosen, and shows it again', () => {
    const d = draft()
    const kept: KeptLoad = {}
    chooseLoad(d.form, 'machine', kept)
    d.form.unbalance = 0.035
    setSpeed(d.form, 24, 26)
    chooseLoad(d.form, 'base', kept)
    expect(d.form.unbalance).toBeUndefined()
    expect(d.form.speed).toBeUndefined()
    d.form.baseAcceleration = 0.4
    chooseLoad(d.form, 'machine', kept)
    expect(d.form).toMatchObject({ unbalance: 0.035, speed: { minHz: 24, maxHz: 26 } })
    expect(d.form.baseAcceleration).toBeUndefined()
    chooseLoad(d.form, 'base', kept)
    expect(d.form.baseAcceleration).toBe(0.4)
  })

  it('puts a set band aside for a running speed (the API takes one or the other) and back', () => {
    const d = draft()
    const kept: KeptLoad = {}
    d.form.band = { minHz: 2, maxHz: 9 }
    chooseLoad(d.form, 'machine', kept)
    expect(d.form.band).toBeUndefined()
    expect(sent(d).success).toBe(true)
    chooseLoad(d.form, 'force', kept)
    expect(d.form.band).toEqual({ minHz: 2, maxHz: 9 })
  })

  it('reads a form saved before load kinds existed as one force', () => {
    const d = draft()
    d.form.loadPresetId = 'rotating-unbalance'
    expect(loadChoiceOf(d.form)).toBe('force')
  })

  it('gives one running speed, or a range when the highest is given', () => {
    const d = draft()
    setSpeed(d.form, 24.5, undefined)
    expect(d.form.speed).toEqual({ hz: 24.5 })
    setSpeed(d.form, 24.5, 26)
    expect(d.form.speed).toEqual({ minHz: 24.5, maxHz: 26 })
  })
})
