/**
 * The one random generator of the tests: mulberry32, a small 32-bit seeded generator (Tommy
 * Ettinger's public-domain design, from memory), uniform numbers in [0, 1), the same sequence for
 * the same seed, so every failure repeats. Names that must differ between runs on a shared
 * database use `randomBytes` instead; that is uniqueness, not test data.
 */
export function seeded(seed: number): () => number {
  let a = seed >>> 0
  return () => {
    a = (a + 0x6d2b79f5) >>> 0
    let t = a
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}

/** Standard normal deviates by the Box–Muller transform (Box & Muller, 1958). */
export function gaussian(uniform: () => number): () => number {
  return () => {
    const u = 1 - uniform() // (0, 1]: the logarithm stays finite
    const v = uniform()
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v)
  }
}
