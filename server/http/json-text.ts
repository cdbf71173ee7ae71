/**
 * A JSON document kept as its text: an engine result made in a worker thread and stored as it
 * came, answered as it is stored. The event loop never parses or re-serialises it, which for a
 * 500-node sizing was several milliseconds of every request that stored or read one.
 *
 * `T` is the type the text holds, for the route's answer type; nothing checks it here (the API
 * tests check every answer against its route's schema).
 */
export class JsonText<T = unknown> {
  declare private readonly holds?: T
  constructor(readonly text: string) {}

  /** The value, parsed: for the odd caller that needs it (JSON.stringify of a whole answer). */
  toJSON(): T {
    return JSON.parse(this.text) as T
  }
}

/**
 * The JSON of an answer whose top-level fields may be JsonText: the other fields are stringified
 * as JSON.stringify would (they are small), and each text is placed as it is. A JsonText deeper
 * down is still correct, through its toJSON, only not as cheap.
 */
export function answerJson(value: unknown): string {
  if (value instanceof JsonText) return value.text
  if (!isPlainObject(value) || !Object.values(value).some((v) => v instanceof JsonText))
    return JSON.stringify(value) ?? 'null'
  const texts: string[] = []
  const rest: Record<string, unknown> = {}
  for (const [key, v] of Object.entries(value)) {
    if (v instanceof JsonText) texts.push(`${JSON.stringify(key)}:${v.text}`)
    else rest[key] = v
  }
  const head = JSON.stringify(rest)
  if (!texts.length) return head
  return `${head.slice(0, -1)}${head === '{}' ? '' : ','}${texts.join(',')}}`
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (v === null || typeof v !== 'object') return false
  const proto = Object.getPrototypeOf(v) as unknown
  return proto === Object.prototype || proto === null
}
