import { z } from 'zod'

/**
 * Edit distance between two texts: insertions, deletions and substitutions (Levenshtein 1966),
 * by the two-row dynamic programme (Wagner & Fischer 1974).
 */
export function editDistance(a: string, b: string): number {
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j)
  for (let i = 1; i <= a.length; i++) {
    const row = [i]
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1
      row.push(Math.min((prev[j] ?? 0) + 1, (row[j - 1] ?? 0) + 1, (prev[j - 1] ?? 0) + cost))
    }
    prev = row
  }
  return prev[b.length] ?? 0
}

/**
 * The known key a misspelt one most likely meant: the same letters in another case, or at most
 * two edits away (and fewer edits than the key has letters), the nearest first.
 * @param key the unknown key
 * @param known the keys the object accepts
 */
export function likelyKey(key: string, known: readonly string[]): string | null {
  const lower = key.toLowerCase()
  const same = known.find((k) => k.toLowerCase() === lower)
  if (same) return same
  let best: string | null = null
  let bestDistance = 3
  for (const k of known) {
    const d = editDistance(lower, k.toLowerCase())
    if (d < bestDistance && d < key.length) [best, bestDistance] = [k, d]
  }
  return best
}

/**
 * "unknown key 'hostDampingRatios' — did you mean 'hostDampingRatio'?", one clause per key.
 * @param keys the unknown keys
 * @param known the keys the object accepts
 */
export function unknownKeysMessage(keys: readonly string[], known: readonly string[]): string {
  return keys
    .map((key) => {
      const near = likelyKey(key, known)
      return `unknown key '${key}'${near ? ` — did you mean '${near}'?` : ''}`
    })
    .join('; ')
}

/**
 * A zod object that refuses unknown keys, naming each and the key it most likely meant, so a
 * misspelt option is an error instead of a silent default.
 * @param shape the object's fields
 */
export function strictObject<T extends z.ZodRawShape>(shape: T) {
  const known = Object.keys(shape)
  return z.strictObject(shape, {
    error: (issue) =>
      issue.code === 'unrecognized_keys' ? unknownKeysMessage(issue.keys, known) : undefined,
  })
}
