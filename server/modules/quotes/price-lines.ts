import { nullIfMissing } from '../../http/app-error'
import { builtMass, matchUnits, quoteTotals, unitPrice } from '../../../shared/catalogue'
import type { Currency } from '../../../shared/money'
import type { QuoteLineInput } from '../../../shared/schemas/quote'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import type { CatalogueService } from '../catalogue/catalogue.service'
import type { LineWrite } from './quote-rows'
import { assignUnits, lineError, unitsText } from './unit-lines'
import { demandOfUnit } from '../../../shared/catalogue/unit-demand'

async function priceUnit(
  catalogue: CatalogueService,
  l: Extract<QuoteLineInput, { kind: 'unit' }>,
  i: number,
  sizing: SizingSummary,
  currency: Currency,
  units: number[] | null,
): Promise<LineWrite> {
  const unit = await nullIfMissing(catalogue.line(l.productLineId))
  if (!unit || !unit.active) throw lineError(i, 'productLineId', 'no such product line')
  const demands = (units ?? [1]).map((n) => demandOfUnit(sizing, n))
  for (const [j, demand] of demands.entries()) {
    const [match] = matchUnits(demand, [unit])
    if (match?.fits) continue
    const why = match?.reasons.map((r) => r.message).join('; ') ?? ''
    const what = units ? `absorber ${units[j]}` : 'this sizing'
    throw lineError(i, 'productLineId', `${unit.code} cannot carry ${what}: ${why}`)
  }
  const masses = demands.map((d) => builtMass(d.mass, unit.massStep))
  const mass = masses[0] ?? 0
  if (masses.some((m) => m !== mass))
    throw lineError(i, 'absorbers', 'these absorbers differ in built mass: put each on a line')
  const price = unitPrice(unit.prices[currency], demands[0]?.mass ?? 0, unit.massStep)
  const text = `${unit.name}, ${mass} kg moving mass, ${unit.orientation}, ${unit.damperType} damper`
  return {
    kind: 'unit',
    productLineId: unit.id,
    optionId: null,
    code: unit.code,
    description: units ? `${text}, for ${unitsText(sizing, units)}` : text,
    builtMass: mass,
    ...(units && { absorbers: units }),
    quantity: l.quantity,
    unitPrice: price,
    lineTotal: price * l.quantity,
  }
}

/**
 * Prices the lines a client asked for from the catalogue and the sizing, on the server only;
 * the client never sends a price. Errors name the line's field.
 */
export async function priceLines(
  catalogue: CatalogueService,
  inputs: readonly QuoteLineInput[],
  sizing: SizingSummary,
  currency: Currency,
): Promise<LineWrite[]> {
  const out: LineWrite[] = []
  const units = assignUnits(inputs, sizing)
  for (const [i, l] of inputs.entries()) {
    if (l.kind === 'unit') {
      out.push(await priceUnit(catalogue, l, i, sizing, currency, units[i] ?? null))
      continue
    }
    const opt = await nullIfMissing(catalogue.option(l.optionId))
    if (!opt || !opt.active) throw lineError(i, 'optionId', 'no such option')
    const price = opt.prices[currency]
    out.push({
      kind: opt.kind,
      productLineId: null,
      optionId: opt.id,
      code: opt.code,
      description: `${opt.name} (per ${opt.per})`,
      builtMass: null,
      quantity: l.quantity,
      unitPrice: price,
      lineTotal: price * l.quantity,
    })
  }
  return out
}

/** Totals by the one rounding rule of shared/catalogue/pricing.ts. */
export function totalsOf(lines: readonly LineWrite[], discountBp: number, taxBp: number) {
  return quoteTotals(lines, discountBp, taxBp)
}
