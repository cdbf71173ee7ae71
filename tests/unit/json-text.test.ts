/**
 * Answers holding stored JSON texts (server/http/json-text.ts) must be the very JSON that
 * JSON.stringify gives for the parsed value: clients cannot tell the difference.
 */
import { describe, expect, it } from 'vitest'
import { answerJson, JsonText } from '../../server/http/json-text'

const stored = { frequencyHz: [1.5, 2.25, 1e-12], label: 'mode "1"', none: null }
const text = JSON.stringify(stored)

describe('answers with stored JSON texts', () => {
  it('places a top-level text as it is stored, beside the other fields', () => {
    const answer = { id: 7, title: 'Deck, bay 2', at: new Date(0), gone: undefined }
    const json = answerJson({ ...answer, evaluation: new JsonText(text) })
    expect(json).toContain(`"evaluation":${text}`)
    expect(JSON.parse(json)).toEqual(JSON.parse(JSON.stringify({ ...answer, evaluation: stored })))
  })

  it('answers an object whose only field is a text, and a text alone', () => {
    expect(answerJson({ evaluation: new JsonText(text) })).toBe(`{"evaluation":${text}}`)
    expect(answerJson(new JsonText(text))).toBe(text)
  })

  it('gives what JSON.stringify gives for anything without a text', () => {
    for (const v of [{ a: 1, b: [1, 2], c: 'x' }, [1, { a: 2 }], 'plain', 3, null, {}])
      expect(answerJson(v)).toBe(JSON.stringify(v))
  })

  it('places a text in a nested object as it is, and parses one inside an array', () => {
    const nested = answerJson({ record: { id: 3, result: new JsonText(text), gone: undefined } })
    expect(nested).toBe(`{"record":{"id":3,"result":${text}}}`)
    const value = { list: [{ evaluation: new JsonText(text) }] }
    expect(JSON.parse(answerJson(value))).toEqual({ list: [{ evaluation: stored }] })
  })
})
