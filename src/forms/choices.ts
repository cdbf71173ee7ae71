/** One entry of a list of choices, the shape BaseSelect shows. */
export interface Choice<T> {
  label: string
  value: T
}

/**
 * Fixed values as choices, each shown in words.
 * @param words how a value reads; the value itself when left out
 */
export function choicesOf<T extends string>(
  values: readonly T[],
  words: (value: T) => string = (v) => v,
): Choice<T>[] {
  return values.map((value) => ({ label: words(value), value }))
}

/** Named records (customers, contacts) as choices: the name shown, the id chosen. */
export function choicesByName(items: readonly { id: number; name: string }[]): Choice<number>[] {
  return items.map((i) => ({ label: i.name, value: i.id }))
}

/** A structure kind in words ("floor", "foot bridge"). */
export const kindWords = (kind: string) => kind.replace('-', ' ')
