import { builtMass, matchUnits, quoteTotals, unitPrice } from '../../../shared/catalogue'
import type { Currency } from '../../../shared/money'
import type { QuoteLineInput } from '../../../shared/schemas/quote'
import type { SizingSummary } from '../../../shared/schemas/sizing'
import { AppError } from '../../http/app-error'
import { demandOf, type CatalogueService } from '../catalogue/catalogue.service'
import type { LineWrite } from './quote-rows'

function lineError(index: number, field: string, message: string) {
  const path = `body.lines.${index}.${field}`
  return new AppError('invalid-line', `${path}: ${message}`, 400, [{ path, message }])
}

async function priceUnit(
  catalogue: CatalogueService,
  l: Extract<QuoteLineInput, { kind: 'unit' }>,
  i: number,
  sizing: SizingSummary,
  currency: Currency,
): Promise<LineWrite> {
  const unit = await catalogue.line(l.productLineId).catch(() => null)
  if (!unit || !unit.active) throw lineError(i, 'productLineId', 'no such product line')
  const [match] = matchUnits(demandOf(sizing), [unit])
  if (!match?.fits) {
    const why = match?.reasons.map((r) => r.message).join('; ') ?? ''
    throw lineError(i, 'productLineId', `${unit.code} cannot carry this sizing: ${why}`)
  }
  const mass = builtMass(sizing.absorber.mass, unit.massStep)
  const price = unitPrice(unit.prices[currency], sizing.absorber.mass, unit.massStep)
  return {
    kind: 'unit',
    productLineId: unit.id,
    optionId: null,
    code: unit.code,
    description: `${unit.name}, ${mass} kg moving mass, ${unit.orientation}, ${unit.damperType} damper`,
    builtMass: mass,
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
  for (const [i, l] of inputs.entries()) {
    if (l.kind === 'unit') {
      out.push(await priceUnit(catalogue, l, i, sizing, currency))
      continue
    }
    const opt = await catalogue.option(l.optionId).catch(() => null)
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
