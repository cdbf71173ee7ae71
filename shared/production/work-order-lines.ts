import type { DeliveryContact } from '../schemas/shipment'
import type { BuildSpecification, WorkOrderEvent } from '../schemas/work-order'
import {
  deviationPercent,
  endStopClearance,
  formatDeviation,
  mountingWords,
  staticDeflection,
} from './work-order-figures'

/** A labelled line of the work order, as the page and the PDF both print it. */
export type Line = [label: string, value: string]

const mm = (m: number) => `${(m * 1000).toFixed(1)} mm`

/**
 * The figures the fitter needs beside the build values: how the unit is mounted, its stroke and
 * the room left to the end stops, and how far the spring settles under the mass.
 */
export function fittingLines(s: BuildSpecification): Line[] {
  const lines: Line[] = [['Mounting', mountingWords(s.orientation)]]
  if (s.stroke !== undefined) lines.push(['Stroke', `${mm(s.stroke)} at the design load`])
  const stops = endStopClearance(s)
  if (stops) {
    const which = s.strokeLimit ? 'stroke limit' : 'unit travel'
    const short = stops.clearance < 0 ? ' — the stroke exceeds the limit: check the end stops' : ''
    lines.push([
      'End-stop clearance',
      `${mm(stops.clearance)} (${which} ${mm(stops.limit)} − stroke ${mm(s.stroke ?? 0)})${short}`,
    ])
  }
  const sag = mm(staticDeflection(s.movingMass, s.springRate))
  lines.push([
    'Static deflection',
    s.orientation === 'vertical'
      ? `${sag} (m·g/k, the spring under the moving mass)`
      : `none in service: a lateral spring carries no weight (m·g/k would be ${sag})`,
  ])
  return lines
}

/** Who takes delivery, or a line saying it was not recorded (older work orders). */
export function deliveryLines(d: DeliveryContact | null): Line[] {
  if (!d) return [['Delivery contact', 'not recorded: ask sales']]
  return [
    ['Delivery contact', d.name || '—'],
    ['Phone', d.phone || '—'],
    ['Site address', d.address || '—'],
  ]
}

/** One tuning reading with its deviation from its target frequency. */
export interface TuningReading {
  id: number
  /** the absorber measured, on a work order of several; else null */
  absorber: number | null
  at: string
  by: string
  measuredHz: number
  targetHz: number
  deviation: string
  passes: boolean
  note: string
}

/**
 * The tuning record: every reading, oldest first, with its deviation in % of its target (on a
 * work order of several absorbers, the target of the absorber the reading names).
 */
export function tuningReadings(
  events: Pick<
    WorkOrderEvent,
    'id' | 'kind' | 'at' | 'actorName' | 'measuredHz' | 'passes' | 'note' | 'absorber'
  >[],
  spec: Pick<BuildSpecification, 'targetFrequencyHz' | 'units'>,
): TuningReading[] {
  const targetOf = (absorber: number | null) =>
    spec.units?.find((u) => u.absorber === absorber)?.targetFrequencyHz ?? spec.targetFrequencyHz
  return events
    .filter((e) => e.kind === 'tuning' && e.measuredHz !== null)
    .map((e) => {
      const absorber = e.absorber ?? null
      const targetHz = targetOf(absorber)
      return {
        id: e.id,
        absorber,
        at: e.at.slice(0, 16).replace('T', ' '),
        by: e.actorName ?? '—',
        measuredHz: e.measuredHz as number,
        targetHz,
        deviation: formatDeviation(deviationPercent(e.measuredHz as number, targetHz)),
        passes: e.passes === true,
        note: e.note,
      }
    })
}
