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
 * Usual mass ratios: floors and footbridges 1–5 %, machinery up to about 25 % (common practice);
 * the schema allows 0.1–50 % and anything else is warned about, not clamped.
 */
const MASS_RATIO_RANGE = [0.005, 0.25] as const

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
  massRatio: field('mass-ratio', 'Mass ratio', 'percent', 'input.massRatio', {
    range: MASS_RATIO_RANGE,
    hint: "of the target mode's effective mass",
  }),
  detuningTolerance: field(
    'detuning-tolerance',
    'Detuning tolerance of the host frequency (±)',
    'percent',
    'input.detuningTolerance',
    { range: [0, 0.2], hint: 'for the robustness check in the results' },
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

/** The number fields of further absorber i: `absorbers[i]`, absorber i + 2 on the screen. */
export function unitQuantities(i: number) {
  const n = i + 2
  const path = (key: string) => `input.absorbers.${i}.${key}`
  return {
    massRatio: field(
      `unit-${n}-ratio`,
      `Mass ratio of absorber ${n}`,
      'percent',
      path('massRatio'),
      {
        range: MASS_RATIO_RANGE,
        hint: "of its mode's effective mass at its node",
      },
    ),
    mass: field(`unit-${n}-mass`, `Mass of absorber ${n}`, 'mass', path('mass')),
  }
}

/** Plausible modal damping ratios of a host structure, 0–20 % (common practice). */
const HOST_DAMPING_RANGE = [0, 0.2] as const

/** The host's damping: one ratio for every mode, or mode i's (its label names its frequency). */
export const HOST_DAMPING = {
  every: field('host-damping', 'Every mode', 'percent', 'definition.hostDampingRatio', {
    range: HOST_DAMPING_RANGE,
  }),
  mode: (i: number, hz: number | undefined) =>
    field(
      `host-damping-${i + 1}`,
      `Damping of mode ${i + 1}${hz ? ` (${hz.toFixed(2)} Hz)` : ''}`,
      'percent',
      `definition.hostDampingRatio.${i}`,
      { range: HOST_DAMPING_RANGE },
    ),
}
