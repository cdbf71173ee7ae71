import type { QuoteLineInput } from '../../../shared/schemas/quote'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import { AppError } from '../../http/app-error'

type UnitLine = Extract<QuoteLineInput, { kind: 'unit' }>

export function lineError(index: number, field: string, message: string) {
  const path = `body.lines.${index}.${field}`
  return new AppError('invalid-line', `${path}: ${message}`, 400, [{ path, message }])
}

/**
 * The absorbers each unit line supplies, for a sizing with several: as the line names them, or
 * else the next ones not yet on a line, as many as its quantity. Every absorber must be on
 * exactly one line and a line's quantity is its number of absorbers. Null for one absorber.
 * @throws AppError 400 naming the line's field
 */
export function assignUnits(inputs: readonly QuoteLineInput[], sizing: SizingSummary) {
  const count = sizing.absorbers?.length ?? 0
  if (count < 2) {
    const named = inputs.findIndex((l) => l.kind === 'unit' && l.absorbers)
    if (named >= 0) throw lineError(named, 'absorbers', 'this sizing has a single absorber')
    return inputs.map(() => null)
  }
  const taken = new Map<number, number>()
  const free = () => Array.from({ length: count }, (_, i) => i + 1).filter((n) => !taken.has(n))
  const out = inputs.map((l, i) => (l.kind === 'unit' ? named(l, i) : null))
  function named(l: UnitLine, i: number) {
    if (!l.absorbers) return null
    for (const n of l.absorbers) {
      if (n > count) throw lineError(i, 'absorbers', `the sizing has ${count} absorbers`)
      if (taken.has(n))
        throw lineError(i, 'absorbers', `absorber ${n} is on line ${taken.get(n)! + 1} already`)
      taken.set(n, i)
    }
    if (l.absorbers.length !== l.quantity)
      throw lineError(
        i,
        'quantity',
        `supplies ${l.absorbers.length} absorbers, so ${l.absorbers.length}`,
      )
    return [...l.absorbers]
  }
  inputs.forEach((l, i) => {
    if (l.kind !== 'unit' || out[i]) return
    const next = free().slice(0, l.quantity)
    if (next.length < l.quantity)
      throw lineError(
        i,
        'quantity',
        `only ${next.length} of the sizing's absorbers are left for it`,
      )
    next.forEach((n) => taken.set(n, i))
    out[i] = next
  })
  const missing = free()
  if (missing.length)
    throw new AppError('invalid-line', `absorber ${missing[0]} is on no unit line`, 400, [
      { path: 'body.lines', message: `absorber ${missing.join(', ')} on no unit line: add a line` },
    ])
  return out
}

/** "absorbers 1, 2 (modes 1, 2)", for a line's description. */
export function unitsText(sizing: SizingSummary, units: readonly number[]) {
  const modes = units.map((n) => sizing.absorbers?.[n - 1]?.targetMode ?? 0)
  const one = units.length === 1
  return `absorber${one ? '' : 's'} ${units.join(', ')} (mode${one ? '' : 's'} ${modes.join(', ')})`
}
