import { gaussian, seeded } from '../../helpers/random'

/** One single-degree-of-freedom mode: natural frequency f (Hz) and damping ratio ζ. */
export interface Mode {
  frequencyHz: number
  dampingRatio: number
}

/**
 * State transition of x'' + 2ζω x' + ω² x = u over a step h (closed form of exp(A h) for a
 * viscously damped oscillator, ζ < 1; Chopra, Dynamics of Structures, §2.2, from memory).
 */
export function transition(mode: Mode, h: number) {
  const w = 2 * Math.PI * mode.frequencyHz
  const s = mode.dampingRatio * w
  const wd = w * Math.sqrt(1 - mode.dampingRatio ** 2)
  const e = Math.exp(-s * h)
  const c = Math.cos(wd * h)
  const sn = Math.sin(wd * h)
  return {
    w2: w * w,
    twoSigma: 2 * s,
    a11: e * (c + (s / wd) * sn),
    a12: (e * sn) / wd,
    a21: (-e * w * w * sn) / wd,
    a22: e * (c - (s / wd) * sn),
  }
}

/**
 * Free decay after an impulse: each mode starts at rest with initial velocity v₀ (m/s); the
 * acceleration a = −ω²x − 2ζωv is exact at every sample. Gaussian noise of `noise` m/s² rms
 * is added from a seeded generator. `preTrigger` seconds of noise only come first.
 */
export function freeDecay(
  modes: { mode: Mode; velocity: number }[],
  sampleRateHz: number,
  durationS: number,
  noise: number,
  seed: number,
  preTriggerS = 0,
): Float64Array {
  const n = Math.round(durationS * sampleRateHz)
  const start = Math.round(preTriggerS * sampleRateHz)
  const normal = gaussian(seeded(seed))
  const out = new Float64Array(n)
  for (const { mode, velocity } of modes) {
    const m = transition(mode, 1 / sampleRateHz)
    let [x, v] = [0, velocity]
    for (let j = start; j < n; j++) {
      out[j] = (out[j] ?? 0) - m.w2 * x - m.twoSigma * v
      ;[x, v] = [m.a11 * x + m.a12 * v, m.a21 * x + m.a22 * v]
    }
  }
  return out.map((a) => a + noise * normal())
}

/**
 * Ambient record: white-noise force per unit mass, held constant over each step, through
 * independent modes, by the exact discrete-time recursion for a zero-order-hold input
 * (x_{j+1} = x_eq + Φ(x_j − x_eq), x_eq = (u/ω², 0)); acceleration a = u − 2ζωv − ω²x,
 * summed over modes with the given gains, plus sensor noise (m/s² rms).
 */
export function ambient(
  modes: { mode: Mode; gain: number }[],
  sampleRateHz: number,
  durationS: number,
  noise: number,
  seed: number,
): Float64Array {
  const n = Math.round(durationS * sampleRateHz)
  const normal = gaussian(seeded(seed))
  const force = Float64Array.from({ length: n }, () => normal())
  const out = Float64Array.from({ length: n }, () => noise * normal())
  for (const { mode, gain } of modes) {
    const m = transition(mode, 1 / sampleRateHz)
    let [x, v] = [0, 0]
    for (let j = 0; j < n; j++) {
      const u = gain * (force[j] ?? 0)
      out[j] = (out[j] ?? 0) + u - m.twoSigma * v - m.w2 * x
      const xe = u / m.w2
      ;[x, v] = [xe + m.a11 * (x - xe) + m.a12 * v, m.a21 * (x - xe) + m.a22 * v]
    }
  }
  return out
}
