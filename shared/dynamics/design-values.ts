import type { AbsorberEvaluation } from './evaluate-absorber'
import type { DesignReport, PeakReport } from './sizing-result'
import type { AbsorberValues } from './tuning-objective'

/** Standard gravity, m/s² (CGPM 1901). */
export const STANDARD_GRAVITY = 9.80665

/** Cautions shown wherever a sizing result is shown (common practice). */
export const SIZING_CAUTIONS: string[] = [
  'This sizing is a design aid, not a design: the final design, the anchorage of the absorber ' +
    'mass and its fall restraint are for a licensed engineer under the local codes.',
  'Provide end stops or snubbers at the maximum stroke and a captive mass or fall restraint over ' +
    'occupied space; re-tune on site to the measured frequency.',
  'Results hold for the model as entered: check masses, stiffnesses and damping against ' +
    'measurements before ordering.',
]

/**
 * Static deflection of a vertical absorber under its own weight, δ = g/ω_a² (Hooke's law with
 * k_a = m_a ω_a²; ≈ 248.4/f² mm with f in Hz).
 * @param omegaA absorber natural frequency, rad/s
 * @returns m
 */
export function staticDeflection(omegaA: number): number {
  return STANDARD_GRAVITY / (omegaA * omegaA)
}

/**
 * Build and check values of one absorber.
 * @param a absorber (kg, N/m, N·s/m)
 * @param ev its evaluation over the band
 * @param peak the peak report (for the reduction)
 * @param load the design load amplitude (excitation.amplitude) and the stroke limit (m) or null
 */
export function designReport(
  a: AbsorberValues,
  ev: AbsorberEvaluation,
  peak: PeakReport,
  load: { amplitude: number; strokeLimit: number | null },
): DesignReport {
  const wa = Math.sqrt(a.stiffness / a.mass)
  const finite = (x: number): number | null => (Number.isFinite(x) ? x : null)
  const maxStroke = finite(ev.maxStroke.value * load.amplitude)
  return {
    mass: a.mass,
    springRate: a.stiffness,
    damperCoefficient: a.damping,
    frequencyHz: wa / (2 * Math.PI),
    staticDeflection: staticDeflection(wa),
    strokePerForceAtPeak: finite(ev.strokeAtPeak),
    maxStrokePerForce: finite(ev.maxStroke.value),
    maxStrokeFrequencyHz: Number.isFinite(ev.maxStroke.value)
      ? ev.maxStroke.omega / (2 * Math.PI)
      : null,
    peakReduction: peak.reduction,
    maxStroke,
    strokeWithinLimit:
      load.strokeLimit === null ? null : maxStroke !== null && maxStroke <= load.strokeLimit,
  }
}
