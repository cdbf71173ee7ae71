import type { ModelInput, NodeInput, SpringInput } from '../schemas/model'
import { ModelError } from './errors'

/**
 * Model templates: a host network from a few numbers. Node ids are fixed so results and charts
 * can refer to them: "ground" (and "support-2" for a span), then numbered free nodes.
 */

function guard(value: number, field: string, unit: string): void {
  if (!Number.isFinite(value) || value <= 0) {
    throw new ModelError(field, `must be a positive finite number${unit}, got ${value}`)
  }
}

function guardCount(n: number, field: string): void {
  if (!Number.isInteger(n) || n < 1)
    throw new ModelError(field, `must be a whole number ≥ 1, got ${n}`)
}

/**
 * One mass on one spring with the measured frequency: k = m (2π f)².
 * @param frequencyHz measured natural frequency, Hz
 * @param modalMass modal (effective) mass of that mode at the absorber position, kg
 * @returns nodes "ground" and "host"
 */
export function singleModeModel(frequencyHz: number, modalMass: number): ModelInput {
  guard(frequencyHz, 'frequencyHz', ' of Hz')
  guard(modalMass, 'modalMass', ' of kg')
  const k = modalMass * (2 * Math.PI * frequencyHz) ** 2
  return {
    nodes: [
      { id: 'ground', fixed: true },
      { id: 'host', mass: modalMass },
    ],
    springs: [{ from: 'ground', to: 'host', stiffness: k }],
  }
}

/**
 * Shear building: storey i (1 = lowest) of mass m_i tied to the storey below by k_i; the ground
 * is fixed and the roof is the last storey (common practice for lateral sway).
 * @param storeyMasses kg, from storey 1 up
 * @param storeyStiffnesses N/m, inter-storey stiffness below each storey
 * @returns nodes "ground", "storey-1" … "storey-n" (labelled "roof" for the last)
 */
export function shearBuildingModel(
  storeyMasses: number[],
  storeyStiffnesses: number[],
): ModelInput {
  if (storeyMasses.length === 0 || storeyMasses.length !== storeyStiffnesses.length) {
    throw new ModelError(
      'storeyStiffnesses',
      'give one stiffness per storey (as many as storeyMasses)',
    )
  }
  const nodes: NodeInput[] = [{ id: 'ground', fixed: true }]
  const springs: SpringInput[] = []
  storeyMasses.forEach((m, i) => {
    guard(m, `storeyMasses[${i}]`, ' of kg')
    guard(storeyStiffnesses[i] ?? NaN, `storeyStiffnesses[${i}]`, ' of N/m')
    const id = `storey-${i + 1}`
    nodes.push({ id, mass: m, label: i === storeyMasses.length - 1 ? 'roof' : `storey ${i + 1}` })
    springs.push({
      from: i === 0 ? 'ground' : `storey-${i}`,
      to: id,
      stiffness: storeyStiffnesses[i] ?? 0,
    })
  })
  return { nodes, springs }
}

function chain(n: number, nodeMass: number, k: number, bothEnds: boolean): ModelInput {
  const nodes: NodeInput[] = [{ id: 'ground', fixed: true }]
  const springs: SpringInput[] = []
  for (let i = 1; i <= n; i++) {
    nodes.push({ id: `node-${i}`, mass: nodeMass })
    springs.push({ from: i === 1 ? 'ground' : `node-${i - 1}`, to: `node-${i}`, stiffness: k })
  }
  if (bothEnds) {
    nodes.push({ id: 'support-2', fixed: true })
    springs.push({ from: `node-${n}`, to: 'support-2', stiffness: k })
  }
  return { nodes, springs }
}

/**
 * A span between two supports lumped into n equal masses on n+1 equal springs, the spring rate
 * set so that mode 1 has the given frequency: ω₁² = (4k/m) sin²(π/(2(n+1))) (fixed–fixed chain,
 * e.g. Meirovitch, Elements of Vibration Analysis). A shear chain: higher modes do not follow a
 * bending beam's f ∝ r², so calibrate each mode used.
 * @param n number of masses
 * @param totalMass kg, shared equally
 * @param firstFrequencyHz measured or estimated first natural frequency, Hz
 * @returns nodes "ground", "node-1" … "node-n", "support-2"
 */
export function spanModel(n: number, totalMass: number, firstFrequencyHz: number): ModelInput {
  guardCount(n, 'n')
  guard(totalMass, 'totalMass', ' of kg')
  guard(firstFrequencyHz, 'firstFrequencyHz', ' of Hz')
  const m = totalMass / n
  const s = Math.sin(Math.PI / (2 * (n + 1)))
  return chain(n, m, (m * (2 * Math.PI * firstFrequencyHz) ** 2) / (4 * s * s), true)
}

/**
 * A cantilever lumped into n equal masses on n equal springs from the fixed root, with mode 1 at
 * the given frequency: ω₁² = (4k/m) sin²(π/(2(2n+1))) (fixed–free chain, same source as above).
 * @param n number of masses; node-n is the free tip
 * @param totalMass kg, shared equally
 * @param firstFrequencyHz Hz
 * @returns nodes "ground", "node-1" … "node-n"
 */
export function cantileverModel(
  n: number,
  totalMass: number,
  firstFrequencyHz: number,
): ModelInput {
  guardCount(n, 'n')
  guard(totalMass, 'totalMass', ' of kg')
  guard(firstFrequencyHz, 'firstFrequencyHz', ' of Hz')
  const m = totalMass / n
  const s = Math.sin(Math.PI / (2 * (2 * n + 1)))
  return chain(n, m, (m * (2 * Math.PI * firstFrequencyHz) ** 2) / (4 * s * s), false)
}
