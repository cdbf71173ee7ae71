import type { FieldKind } from '@shared/field-text'

/** What a number field of the sizing form shows, bound with `v-bind` on a QuantityInput. */
export interface QuantityField {
  inputId: string
  label: string
  kind: FieldKind
  /** the form path whose validation message shows at the field */
  path?: string
  hint?: string
  range?: readonly [number, number]
  /** an empty field means "none" */
  optional?: boolean
}

const field = (
  inputId: string,
  label: string,
  kind: FieldKind,
  path: string | undefined,
  more: Partial<QuantityField> = {},
): QuantityField => ({ inputId, label, kind, path, ...more })

/**
 * The number fields of the sizing steps, each written once: its id (the browser tests find it by
 * it), label, unit kind, validation path, hint and plausible range.
 */
export const SIZING_QUANTITIES = {
  totalForce: field('force-amplitude', 'Total force', 'force', 'input.forceAmplitude', {
    hint: 'the sum of the node forces',
  }),
  forceAmplitude: field('force-amplitude', 'Force amplitude', 'force', 'input.forceAmplitude'),
  baseAcceleration: field(
    'base-acceleration',
    'Support acceleration (peak)',
    'acceleration',
    'input.baseAcceleration',
    { hint: 'e.g. 0,4 m/s² or 4 %g' },
  ),
  unbalance: field('unbalance', 'Unbalance m·e', 'unbalance', 'input.unbalance', {
    hint: 'e.g. 0,02 kg·m, or 20 kg mm',
  }),
  speed: field('running-speed', 'Running speed', 'speed', 'input.speed', {
    hint: 'e.g. 1480 rpm or 24,7 Hz',
  }),
  speedMax: field(
    'running-speed-max',
    'Highest running speed (for a speed range)',
    'speed',
    'input.speed.maxHz',
    { optional: true, hint: 'leave empty for one speed' },
  ),
  // travel of catalogue units is a few mm to about 100 mm (common practice)
  strokeLimit: field(
    'stroke-limit',
    'Stroke limit of the absorber mass (peak)',
    'displacement',
    'input.strokeLimit',
    {
      range: [0.001, 0.2],
      optional: true,
      hint: 'e.g. 25 mm; empty for none. The optimiser keeps the stroke at the design load within it',
    },
  ),
  bandMin: field('band-min', 'From', 'frequency', 'input.band.minHz'),
  bandMax: field('band-max', 'To', 'frequency', 'input.band.maxHz'),
  tuningRatio: field(
    'tuning-ratio',
    'Frequency ratio f = f_absorber / f_target',
    'number',
    'input.tuning.frequencyRatio',
    { range: [0.5, 1.5] },
  ),
  tuningHz: field('tuning-hz', 'or the absorber frequency', 'frequency', undefined),
  tuningDamping: field(
    'tuning-damping',
    'Absorber damping ratio ζ (of its own frequency)',
    'percent',
    'input.tuning.dampingRatio',
    { range: [0, 0.4] },
  ),
} satisfies Record<string, QuantityField>
