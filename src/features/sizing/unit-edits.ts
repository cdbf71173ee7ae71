import type { SizingUnit } from '@shared/schemas/sizing-units'
import type { SizingForm } from './draft'
import { patch } from './patch'

/** Usual mass ratio of a further unit when added (common practice: 1–5 % on floors and spans). */
const NEW_UNIT_RATIO = 0.02

/**
 * A further absorber, at the first absorber's node and the next mode up (a second mode is the
 * usual reason for a second unit), 2 % of that mode's effective mass, tuned with the others.
 * @param modeCount the number of modes of the host, so the new unit aims at one it has (0 when
 *   not known yet)
 */
export function addUnit(form: SizingForm, modeCount: number) {
  const units = (form.absorbers ??= [])
  const taken = Math.max(form.targetMode, ...units.map((u) => u.targetMode))
  units.push({
    node: form.absorberNode,
    // the modes may not be known yet (preview still running): then the next mode up anyway
    targetMode: modeCount > 0 ? Math.min(taken + 1, modeCount) : taken + 1,
    massRatio: NEW_UNIT_RATIO,
  })
}

/** Changes unit i; a key given as undefined is removed (a mass ratio when a mass is given). */
export function setUnit(form: SizingForm, i: number, change: Partial<SizingUnit>) {
  const unit = form.absorbers?.[i]
  if (unit) patch(unit, change)
}

/** Removes unit i; the list goes when empty, so the sizing is a single absorber again. */
export function removeUnit(form: SizingForm, i: number) {
  form.absorbers?.splice(i, 1)
  if (!form.absorbers?.length) delete form.absorbers
}
