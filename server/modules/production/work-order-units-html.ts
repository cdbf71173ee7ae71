import { esc, sig } from '../../integrations/pdf/html'
import type { BuildSpecification } from '../../../shared/schemas/work-order'

/** The absorbers of a work order of several, each with its build values, tuning target and a
 * box for its own tuning record; nothing for one absorber. */
export function workOrderUnitsHtml(s: BuildSpecification) {
  if (!s.units?.length) return ''
  const rows = s.units.map(
    (u) =>
      `<tr><th>Absorber ${u.absorber} (mode ${u.targetMode}, ${esc(u.node)})</th><td>${esc(u.unitCode)}, ` +
      `${sig(u.movingMass, 4)} kg, ${sig(u.springRate / 1000, 4)} kN/m, ${sig(u.damperCoefficient, 4)} N·s/m ` +
      `(ζ ${sig(u.dampingRatio, 3)}); tune to ${sig(u.targetFrequencyHz, 4)} Hz ± ` +
      `${sig(u.frequencyTolerance * 100, 2)} %</td></tr>`,
  )
  const boxes = s.units.map(
    (u) =>
      `<p>Absorber ${u.absorber}: measured frequency (Hz), tuned by, date:</p><div class="box"></div>`,
  )
  return `<h2>${s.units.length} absorbers, each tuned on its own</h2><table><tbody>${rows.join('')}</tbody></table>${boxes.join('')}`
}
