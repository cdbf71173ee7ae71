import { esc, sig } from '../../integrations/pdf/html'
import {
  ACKNOWLEDGEMENT_CSS,
  acknowledgementHtml,
} from '../../integrations/pdf/acknowledgement-html'
import type { BuildSpecification, WorkOrderEvent } from '../../../shared/schemas/work-order'
import type { DeliveryContact } from '../../../shared/schemas/shipment'
import { stateWords } from '../../../shared/production/work-order-figures'
import {
  deliveryLines,
  fittingLines,
  tuningReadings,
} from '../../../shared/production/work-order-lines'
import { tuningRecordHtml } from './tuning-record-html'
import { workOrderUnitsHtml } from './work-order-units-html'

interface Printable {
  number: string
  orderNumber: string
  dueDate: string
  state: string
  specHash: string
  specification: BuildSpecification
  delivery: DeliveryContact | null
  events: WorkOrderEvent[]
}

/** The design load and the stroke the end stops must allow; older work orders have neither. */
function loadRows(s: BuildSpecification): [string, string][] {
  const limit = s.strokeLimit ? ` (limit ${sig(s.strokeLimit * 1000, 3)} mm)` : ''
  return [
    ...(s.designLoad ? [['Design load', s.designLoad] as [string, string]] : []),
    ...(s.stroke !== undefined
      ? [['Stroke', `${sig(s.stroke * 1000, 3)} mm at the design load${limit}`] as [string, string]]
      : []),
  ]
}

const table = (rows: [string, string][]) =>
  `<table><tbody>${rows.map(([k, v]) => `<tr><th>${esc(k)}</th><td>${esc(v)}</td></tr>`).join('')}</tbody></table>`

/** The workshop sheet: the frozen build values, the tuning target and the safety notes. */
export function workOrderHtml(w: Printable, fontCss: string) {
  const s = w.specification
  const rows: [string, string][] = [
    ['Customer', s.companyName],
    ['Site', s.siteName],
    ['Order', w.orderNumber || '—'],
    ['Quote', s.quoteReference],
    ['Unit', `${s.quantity} × ${s.unitDescription} (${s.unitCode})`],
    ['Moving mass', `${sig(s.movingMass, 4)} kg`],
    ['Spring rate', `${sig(s.springRate / 1000, 4)} kN/m`],
    ['Damper coefficient', `${sig(s.damperCoefficient, 4)} N·s/m (ζ ${sig(s.dampingRatio, 3)})`],
    [
      'Target frequency',
      `${sig(s.targetFrequencyHz, 4)} Hz ± ${sig(s.frequencyTolerance * 100, 2)} %`,
    ],
    ...loadRows(s),
    ...fittingLines(s).filter(([k]) => k !== 'Stroke'),
    ['Options', s.options.join('; ') || '—'],
  ]
  return `<!doctype html><html><head><meta charset="utf-8"><style>${fontCss}
body{font-family:Lato,sans-serif;font-size:11pt;color:#1b1f1a;margin:0}
h1{color:#0f4c5c;margin:0 0 4mm}th{text-align:left;padding:2mm 6mm 2mm 0;vertical-align:top}td{padding:2mm 0}
table{border-collapse:collapse;width:100%}tr{border-bottom:0.3mm solid #d9ddd6}
.box{border:0.4mm solid #1b1f1a;height:14mm;margin:2mm 0 5mm}.caution{border-left:2mm solid #b86e00;background:#fff6e6;padding:3mm 4mm;margin-top:6mm}
.hash{font-family:monospace;font-size:8pt;word-break:break-all}.tuning th,.tuning td{padding:1.5mm 3mm 1.5mm 0;font-size:10pt}${ACKNOWLEDGEMENT_CSS}</style></head><body>
<h1>Work order ${esc(w.number)}</h1>
<p>Due ${esc(w.dueDate)} · ${esc(stateWords(w.state))}</p>
${table(rows)}
<h2>Delivery</h2>${table(deliveryLines(w.delivery))}
${acknowledgementHtml(s.designAcknowledgement, { names: true, confirmedBy: s.designConfirmation })}
${workOrderUnitsHtml(s)}
<h2>Tuning record</h2><p>${s.units ? 'Each absorber’s target is in the table above,' : `Target ${esc(sig(s.targetFrequencyHz, 4))} Hz`} ± ${esc(sig(s.frequencyTolerance * 100, 2))} %; deviation = (measured − target) / target.</p>
${tuningRecordHtml(tuningReadings(w.events, s))}
<p class="hash">Specification hash ${esc(w.specHash)}</p>
<p class="caution">Build to this frozen specification only. Fit end stops at the maximum stroke and the
restraint of the moving mass against falling; installation and anchorage are for a licensed engineer
under the local codes.</p></body></html>`
}
