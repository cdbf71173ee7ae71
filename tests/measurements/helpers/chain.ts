import { gaussian, seeded } from '../../helpers/random'
import { transition } from './synthesize'

/** A classical normal mode: frequency, damping ratio and mass-normalised shape. */
export interface NormalMode {
  frequencyHz: number
  dampingRatio: number
  /** mass-normalised, one entry per mass */
  shape: number[]
}

/**
 * Modes of n equal masses m between two supports joined by n+1 equal springs k:
 * ω_r² = (4k/m) sin²(rπ/(2(n+1))), φ_jr = sin(j r π/(n+1)) (textbook closed form for the
 * uniform fixed–fixed chain; docs/engineering/host-model.md#chain-check-values), scaled so φᵀMφ = 1
 * (Σ_j sin²(j r π/(n+1)) = (n+1)/2).
 * @param n masses
 * @param m kg
 * @param k N/m
 * @param dampingRatio the same modal damping for every mode
 */
export function chainModes(n: number, m: number, k: number, dampingRatio: number): NormalMode[] {
  const scale = Math.sqrt(2 / ((n + 1) * m))
  return Array.from({ length: n }, (_, i) => {
    const r = i + 1
    const omega = 2 * Math.sqrt(k / m) * Math.sin((r * Math.PI) / (2 * (n + 1)))
    const shape = Array.from(
      { length: n },
      (_, j) => scale * Math.sin(((j + 1) * r * Math.PI) / (n + 1)),
    )
    return { frequencyHz: omega / (2 * Math.PI), dampingRatio, shape }
  })
}

/**
 * Acceleration at every mass, a_j = Σ_r φ_jr q̈_r, of modes driven by modal forces held over
 * each sample, from rest or from initial velocities, through the exact discrete-time
 * recursion for a zero-order-hold input (x_{j+1} = x_eq + Φ(x_j − x_eq), x_eq = (u/ω², 0);
 * closed-form state transition Φ, helpers/synthesize); q̈ = u − 2ζω q̇ − ω² q.
 */
function superpose(
  modes: NormalMode[],
  sampleRateHz: number,
  n: number,
  modalForce: (mode: NormalMode, j: number) => number,
  velocity: (mode: NormalMode) => number,
): Float64Array[] {
  const dofs = modes[0]?.shape.length ?? 0
  const out = Array.from({ length: dofs }, () => new Float64Array(n))
  for (const mode of modes) {
    const t = transition(mode, 1 / sampleRateHz)
    let [x, v] = [0, velocity(mode)]
    for (let j = 0; j < n; j++) {
      const u = modalForce(mode, j)
      const a = u - t.twoSigma * v - t.w2 * x
      for (let d = 0; d < dofs; d++) out[d]![j] = (out[d]![j] ?? 0) + (mode.shape[d] ?? 0) * a
      const xe = u / t.w2
      ;[x, v] = [xe + t.a11 * (x - xe) + t.a12 * v, t.a21 * (x - xe) + t.a22 * v]
    }
  }
  return out
}

/**
 * Ambient acceleration at every mass of a classically damped structure: independent
 * Gaussian white forces (seeded) at every mass, held over each sample; each mode q_r driven
 * by u_r = φ_rᵀ f (see superpose), then independent sensor noise on every channel.
 * @param modes all modes of the structure (the direct term M⁻¹f needs every one)
 * @param sampleRateHz Hz
 * @param durationS s
 * @param force rms force per mass, N
 * @param noise sensor noise, m/s² rms
 * @param seed generator seed
 * @returns one acceleration channel per mass, m/s²
 */
export function ambientResponse(
  modes: NormalMode[],
  sampleRateHz: number,
  durationS: number,
  force: number,
  noise: number,
  seed: number,
): Float64Array[] {
  const n = Math.round(durationS * sampleRateHz)
  const dofs = modes[0]?.shape.length ?? 0
  const normal = gaussian(seeded(seed))
  const forces = Array.from({ length: dofs }, () => Float64Array.from({ length: n }, normal))
  const modalForce = (mode: NormalMode, j: number) =>
    mode.shape.reduce((u, phi, d) => u + phi * force * (forces[d]?.[j] ?? 0), 0)
  const out = superpose(modes, sampleRateHz, n, modalForce, () => 0)
  return out.map((c) => c.map((a) => a + noise * normal()))
}

/**
 * Free decay at every mass after an impulse I (N·s) at one mass, from rest: each mode starts
 * with velocity q̇_r(0) = φ_{j,r} I (see superpose), exact at every sample; sensor noise added.
 * @param modes all modes (mass-normalised shapes)
 * @param at index of the struck mass
 * @param impulse N·s
 */
export function impulseResponse(
  modes: NormalMode[],
  at: number,
  impulse: number,
  sampleRateHz: number,
  durationS: number,
  noise: number,
  seed: number,
): Float64Array[] {
  const n = Math.round(durationS * sampleRateHz)
  const normal = gaussian(seeded(seed))
  const out = superpose(
    modes,
    sampleRateHz,
    n,
    () => 0,
    (mode) => (mode.shape[at] ?? 0) * impulse,
  )
  return out.map((c) => c.map((a) => a + noise * normal()))
}
