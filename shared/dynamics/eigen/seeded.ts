/**
 * Deterministic pseudo-random numbers in [0, 1) (mulberry32, T. Ettinger 2017, public domain):
 * the engine draws only from a generator seeded here, so every run repeats exactly.
 * @param seed any integer
 */
export function seeded(seed: number): () => number {
  let s = seed >>> 0
  return () => {
    s = (s + 0x6d2b79f5) >>> 0
    let t = s
    t = Math.imul(t ^ (t >>> 15), t | 1)
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61)
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296
  }
}
