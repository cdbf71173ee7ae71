import { beforeEach, describe, expect, it } from 'vitest'
import { SizingInputSchema } from '../../shared/schemas/sizing'
import { formOf, toSizingInput } from '../../src/features/sizing/draft'
import { openNewDraft } from '../helpers/sizing-draft'

function store() {
  const { store: s } = openNewDraft(51, 3)
  s.setChoices({ absorberNode: 'node-2', excitationNode: 'node-2', responseNode: 'node-2' })
  return s
}

beforeEach(() => localStorage.clear())

describe('further absorbers in the sizing draft', () => {
  it('adds a unit for the next mode at the first absorber’s node, and sends it as typed', () => {
    const s = store()
    s.addUnit(3)
    expect(s.current?.form.absorbers).toEqual([{ node: 'node-2', targetMode: 2, massRatio: 0.02 }])
    s.setUnit(0, { node: 'node-1', mass: 180, massRatio: undefined })
    const input = toSizingInput(s.current!)
    expect(input.absorbers).toEqual([{ node: 'node-1', targetMode: 2, mass: 180 }])
    expect(SizingInputSchema.safeParse(input).success).toBe(true)
    // reopened from the stored input exactly as sent
    expect(formOf(input).absorbers).toEqual(input.absorbers)
    expect(s.state).toBe('unsaved')
  })

  it('aims each new unit one mode higher, within the modes the host has', () => {
    const s = store()
    s.addUnit(2)
    s.addUnit(2)
    expect(s.current?.form.absorbers?.map((u) => u.targetMode)).toEqual([2, 2])
  })

  it('goes back to a single absorber when the last further unit is removed', () => {
    const s = store()
    s.addUnit(3)
    s.addUnit(3)
    s.removeUnit(0)
    expect(s.current?.form.absorbers?.map((u) => u.targetMode)).toEqual([3])
    s.removeUnit(0)
    expect(s.current?.form).not.toHaveProperty('absorbers')
    expect(SizingInputSchema.safeParse(toSizingInput(s.current!)).success).toBe(true)
  })

  it('changes nothing on a read-only sizing', () => {
    const s = store()
    s.locked = true
    s.addUnit(3)
    expect(s.current?.form.absorbers).toBeUndefined()
  })
})
