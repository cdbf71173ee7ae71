/** A brute-force maximum, independent of the engine's peak search, for checking it. */

const INV_PHI = (Math.sqrt(5) - 1) / 2

function golden(
  f: (w: number) => number,
  lo: number,
  hi: number,
): { value: number; omega: number } {
  let a = lo
  let b = hi
  let c = b - INV_PHI * (b - a)
  let d = a + INV_PHI * (b - a)
  let fc = f(c)
  let fd = f(d)
  for (let s = 0; s < 60; s++) {
    if (fc > fd) {
      ;[b, d, fd] = [d, c, fc]
      c = b - INV_PHI * (b - a)
      fc = f(c)
    } else {
      ;[a, c, fc] = [c, d, fd]
      d = a + INV_PHI * (b - a)
      fd = f(d)
    }
  }
  return fc > fd ? { value: fc, omega: c } : { value: fd, omega: d }
}

/**
 * The largest value of f over [lo, hi]: `points` log-spaced samples, then 60 golden-section steps
 * between the neighbours of each of the 40 highest local maxima of the samples.
 * @param f the curve, at rad/s
 * @param lo rad/s
 * @param hi rad/s
 * @param points number of samples (default 200 000)
 */
export function denseMax(
  f: (w: number) => number,
  lo: number,
  hi: number,
  points = 200_000,
): { value: number; omega: number } {
  const w = Float64Array.from({ length: points }, (_, i) =>
    i === points - 1 ? hi : lo * (hi / lo) ** (i / (points - 1)),
  )
  const y = w.map(f)
  const maxima: number[] = []
  for (let i = 0; i < points; i++) {
    const v = y[i] ?? 0
    if ((i === 0 || v >= (y[i - 1] ?? 0)) && (i === points - 1 || v >= (y[i + 1] ?? 0)))
      maxima.push(i)
  }
  maxima.sort((a, b) => (y[b] ?? 0) - (y[a] ?? 0))
  let best = { value: -Infinity, omega: lo }
  for (const i of maxima.slice(0, 40)) {
    if ((y[i] ?? 0) > best.value) best = { value: y[i] ?? 0, omega: w[i] ?? 0 }
    const p = golden(f, w[Math.max(i - 1, 0)] ?? lo, w[Math.min(i + 1, points - 1)] ?? hi)
    if (p.value > best.value) best = p
  }
  return best
}
