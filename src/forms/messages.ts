/**
 * Validation messages in people's words. zod's own wording ("Too small: expected number to be
 * >=0.001") is for developers; the schemas' custom messages ("must be above zero") pass through.
 */
const RULES: [RegExp, (m: RegExpExecArray) => string][] = [
  [/^Invalid input: expected \w+, received (undefined|null)/, () => 'required'],
  [/^Invalid input: expected number, received NaN/, () => 'a number is needed'],
  [
    /^Invalid input: expected (\w+)/,
    (m) => `expected ${m[1] === 'int' ? 'a whole number' : `a ${m[1]}`}`,
  ],
  [/^Too small: expected string to have >=?1 char/, () => 'required'],
  [/^Too small: expected string to have >=?(\d+)/, (m) => `at least ${m[1]} characters`],
  [/^Too small: expected array to have >=?(\d+)/, (m) => `add at least ${m[1]}`],
  [/^Too small: expected number to be >(\S+)$/, (m) => `must be above ${m[1]}`],
  [/^Too small: expected number to be >=(\S+)$/, (m) => `at least ${m[1]}`],
  [/^Too big: expected string to have <=?(\d+)/, (m) => `at most ${m[1]} characters`],
  [/^Too big: expected array to have <=?(\d+)/, (m) => `at most ${m[1]} items`],
  [/^Too big: expected number to be <(\S+)$/, (m) => `must be below ${m[1]}`],
  [/^Too big: expected number to be <=(\S+)$/, (m) => `at most ${m[1]}`],
  [/^Invalid email address/, () => 'not an e-mail address'],
  [/^Invalid option/, () => 'choose one of the options'],
  [/^Invalid string: must match pattern/, () => 'not in the expected form'],
  [/^Invalid input/, () => 'not a valid value'],
]

/** A validation message as a person should read it next to a field. */
export function peopleWords(message: string): string {
  for (const [re, say] of RULES) {
    const m = re.exec(message)
    if (m) return say(m)
  }
  return message
}

const words = (key: string) => {
  const w = key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase()
  return w.charAt(0).toUpperCase() + w.slice(1)
}
const singular = (key: string) => words(key).toLowerCase().replace(/s$/, '')

/**
 * A field path as words, for a summary away from the field: "definition.springs.2.stiffness" →
 * "Stiffness of spring 3", "input.massRatio" → "Mass ratio".
 */
export function pathWords(path: string, labels: Record<string, string> = {}): string {
  if (labels[path]) return labels[path]
  const parts = path.split('.').filter((p) => !['body', 'input', 'definition'].includes(p))
  const [a, b, c] = parts.slice(-3)
  if (parts.length >= 3 && a && b && c && /^\d+$/.test(b))
    return `${words(c)} of ${singular(a)} ${Number(b) + 1}`
  const last = parts[parts.length - 1]
  if (last && /^\d+$/.test(last) && parts.length >= 2)
    return `${words(parts[parts.length - 2] ?? '')} ${Number(last) + 1}`
  return last ? words(last) : 'A value'
}
