import { describe, expect, it } from 'vitest'
import { ModelError, solveSizing } from '../../shared/dynamics'
import { modelSchema } from '../../shared/schemas/model'
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

  for (const c of invalidCases) {
    it(`refuses ${c.name} with a ModelError naming ${c.field}`, () => {
      const e = caught(() => solveSizing(c.model))
      expect(e).toBeInstanceOf(ModelError)
      expect(e).toBeInstanceOf(RangeError)
      expect((e as ModelError).field).toBe(c.field)
      expect((e as ModelError).message).toMatch(c.message)
    })
  }

  it('gives every invalid case its own message', () => {
    const messages = invalidCases.map((c) => (caught(() => solveSizing(c.model)) as Error).message)
    expect(new Set(messages).size).toBe(invalidCases.length)
  })

  it('the schema rejects a wrong shape and names the path', () => {
    const r = modelSchema.safeParse({ nodes: [{ id: 'a' }], springs: [{ from: 'a', to: 'b' }] })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0]?.path).toEqual(['springs', 0, 'stiffness'])
  })
})
