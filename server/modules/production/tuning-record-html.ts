import { esc } from '../../integrations/pdf/html'
import type { TuningReading } from '../../../shared/production/work-order-lines'

/**
 * The tuning record of the workshop sheet: every reading with its deviation from the target;
 * with none yet, a box to write the first one in by hand.
 */
export function tuningRecordHtml(readings: TuningReading[]) {
  if (readings.length === 0)
    return '<p>No reading recorded yet. Measured frequency (Hz), tuned by, date:</p><div class="box"></div>'
  // a work order of several absorbers names the one each reading is of
  const several = readings.some((r) => r.absorber !== null)
  const unit = (r: TuningReading) => (several ? `<td>${esc(r.absorber ?? '—')}</td>` : '')
  const rows = readings
    .map(
      (r) =>
        `<tr>${unit(r)}<td>${esc(r.at)}</td><td>${esc(r.measuredHz)} Hz</td><td>${esc(r.deviation)}</td><td>${r.passes ? 'within tolerance' : 'out of tolerance'}</td><td>${esc(r.by)}${r.note ? ` — ${esc(r.note)}` : ''}</td></tr>`,
    )
    .join('')
  return `<table class="tuning"><thead><tr>${several ? '<th>Absorber</th>' : ''}<th>Date (UTC)</th><th>Measured</th><th>Deviation</th><th>Result</th><th>By</th></tr></thead><tbody>${rows}</tbody></table>`
}
