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
 * The JSON of an answer that may hold JsonText values in its (nested) plain objects: what
 * holds none is stringified as JSON.stringify would, and each text is placed as it is. A
 * JsonText inside an array is still correct, through its toJSON, only not as cheap.
 */
export function answerJson(value: unknown): string {
  if (value instanceof JsonText) return value.text
  if (!holdsText(value)) return JSON.stringify(value) ?? 'null'
  const parts: string[] = []
  for (const [key, v] of Object.entries(value)) {
    if (v === undefined || typeof v === 'function' || typeof v === 'symbol') continue
    parts.push(`${JSON.stringify(key)}:${answerJson(v)}`)
  }
  return `{${parts.join(',')}}`
}

/** Whether a plain object holds a JsonText among its values or its plain objects' values. */
function holdsText(v: unknown): v is Record<string, unknown> {
  if (!isPlainObject(v)) return false
  for (const x of Object.values(v)) if (x instanceof JsonText || holdsText(x)) return true
  return false
}

function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (v === null || typeof v !== 'object') return false
  const proto = Object.getPrototypeOf(v) as unknown
  return proto === Object.prototype || proto === null
}
