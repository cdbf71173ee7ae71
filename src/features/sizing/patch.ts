/**
 * Sets the fields of `target` that `change` gives; a field given as undefined is removed, so no
 * `undefined` is left in a stored form or model (an optional choice cleared, a mass ratio dropped
 * when a mass is given).
 */
export function patch<T extends object>(target: T, change: Partial<T>) {
  for (const [k, v] of Object.entries(change) as [keyof T, T[keyof T] | undefined][]) {
    if (v === undefined) delete target[k]
    else target[k] = v
  }
}
