import { describe, expect, it } from 'vitest'
import { ModelError, solveSizing } from '../../shared/dynamics'
import { modelSchema } from '../../shared/schemas/model'
import { editDistance, likelyKey } from '../../shared/schemas/strict'
import { invalidCases, validModel } from './invalid-models'

function caught(f: () => unknown): unknown {
  try {
    f()
  } catch (e) {
    return e
  }
  return undefined
}

describe('validation before any solve (common practice: refuse, naming the field)', () => {
  it('accepts the valid base model', () => {
    expect(modelSchema.safeParse(validModel()).success).toBe(true)
    expect(solveSizing(validModel()).modes).toHaveLength(2)
  })

  const engineCases = invalidCases.filter((c) => !c.schemaOnly)
  for (const c of engineCases) {
    it(`refuses ${c.name} with a ModelError naming ${c.field}`, () => {
      const e = caught(() => solveSizing(c.model))
      expect(e).toBeInstanceOf(ModelError)
      expect(e).toBeInstanceOf(RangeError)
      expect((e as ModelError).field).toBe(c.field)
      expect((e as ModelError).message).toMatch(c.message)
    })
  }

  it('gives every invalid case its own message', () => {
    const messages = engineCases.map((c) => (caught(() => solveSizing(c.model)) as Error).message)
    expect(new Set(messages).size).toBe(engineCases.length)
  })

  it('the schema rejects a wrong shape and names the path', () => {
    const r = modelSchema.safeParse({ nodes: [{ id: 'a' }], springs: [{ from: 'a', to: 'b' }] })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0]?.path).toEqual(['springs', 0, 'stiffness'])
  })

  // Common practice: a misspelt option must be an error, never a silent default (the case from
  // the field: `hostDampingRatios` ran with zero damping and said nothing).
  it('the schema refuses an unknown key, naming it and the key it most likely meant', () => {
    const r = modelSchema.safeParse({ ...validModel(), hostDampingRatios: 0.02 })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0]?.path).toEqual([])
    expect(r.error?.issues[0]?.message).toBe(
      "unknown key 'hostDampingRatios' — did you mean 'hostDampingRatio'?",
    )
  })

  it('the schema refuses unknown keys in nested objects too, with a case-insensitive match', () => {
    const model = validModel()
    const r = modelSchema.safeParse({
      ...model,
      absorber: { ...model.absorber, MassRatio: 0.02, massRatio: undefined },
    })
    expect(r.error?.issues[0]?.path).toEqual(['absorber'])
    expect(r.error?.issues[0]?.message).toBe("unknown key 'MassRatio' — did you mean 'massRatio'?")
    const far = modelSchema.safeParse({ ...model, colour: 'red' })
    expect(far.error?.issues[0]?.message).toBe("unknown key 'colour'")
  })
})

describe('near-miss suggestions', () => {
  // Source: Levenshtein distance (Levenshtein 1966); values checked by hand.
  it('measures edit distance and suggests only close keys', () => {
    expect(editDistance('kitten', 'sitting')).toBe(3)
    expect(editDistance('', 'abc')).toBe(3)
    expect(likelyKey('responce', ['response', 'excitation'])).toBe('response')
    expect(likelyKey('TARGETMODE', ['targetMode'])).toBe('targetMode')
    expect(likelyKey('xy', ['band'])).toBeNull()
  })
})
