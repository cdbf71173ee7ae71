import type { QuoteEvent, QuoteLine } from '../../../shared/schemas/quote'
import type { QuoteEntity } from './quote.entity'
import type { QuoteEventEntity } from './quote-event.entity'

/** A quote revision as the repository hands it out: plain data, dates as Date. */
export type QuoteRow = Omit<
  QuoteEntity,
  'company' | 'contact' | 'createdBy' | 'lines' | 'designConfirmedBy'
> & {
  companyName: string
  contactName: string | null
  contactEmail: string | null
  createdByName: string
  designConfirmedByName: string | null
  lines: QuoteLine[]
}

export type LineWrite = Omit<QuoteLine, 'position'>

export type QuoteWrite = Pick<
  QuoteEntity,
  | 'number'
  | 'year'
  | 'seq'
  | 'revision'
  | 'sizingId'
  | 'sizing'
  | 'companyId'
  | 'contactId'
  | 'currency'
  | 'discountBp'
  | 'taxBp'
  | 'taxRateId'
  | 'taxRateName'
  | 'validUntil'
  | 'terms'
  | 'subtotal'
  | 'discount'
  | 'discountedSubtotal'
  | 'tax'
  | 'total'
  | 'createdById'
> & { lines: LineWrite[] }

export function toRow(e: QuoteEntity): QuoteRow {
  const { company, contact, createdBy, lines, designConfirmedBy, ...rest } = e
  return {
    ...rest,
    companyName: company?.name ?? '',
    contactName: contact?.name ?? null,
    contactEmail: contact?.email ?? null,
    createdByName: createdBy?.name ?? '',
    designConfirmedByName: designConfirmedBy?.name ?? null,
    lines: (lines ?? [])
      .sort((a, b) => a.position - b.position)
      .map((l) => ({
        position: l.position,
        kind: l.kind,
        productLineId: l.productLineId,
        optionId: l.optionId,
        code: l.code,
        description: l.description,
        builtMass: l.builtMass,
        ...(l.absorbers && { absorbers: l.absorbers.split(',').map(Number) }),
        quantity: l.quantity,
        unitPrice: l.unitPrice,
        lineTotal: l.lineTotal,
      })),
  }
}

export function toEvent(e: QuoteEventEntity): QuoteEvent {
  return {
    fromState: e.fromState,
    toState: e.toState,
    actorId: e.actorId,
    actorName: e.actor?.name ?? null,
    at: e.at.toISOString(),
    note: e.note,
  }
}
