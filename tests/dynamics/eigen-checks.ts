import { EigenvalueDecomposition, Matrix } from 'ml-matrix'
import { validateHost } from '../../shared/dynamics'
import { assembleLaplacian } from '../../shared/dynamics/assemble'
import { condense } from '../../shared/dynamics/condense'
import type { Modes } from '../../shared/dynamics/types'
import type { ModelInput } from '../../shared/schemas/model'

/** K̂ (N/m, row-major) and the diagonal of M (kg) of a model, as the engine assembles them
 * (massless nodes condensed statically). */
export function matricesOf(model: ModelInput): { n: number; k: Float64Array; m: Float64Array } {
  const { host } = validateHost(model)
  const n = host.ids.length
  const k = assembleLaplacian(n, host.springs, (s) => s.stiffness)
  if (host.massless.length === 0) return { n, k, m: host.mass }
  const c = condense(k, host.massless, n)
  const m = Float64Array.from(c.keep, (i) => host.mass[i] ?? 0)
  return { n: m.length, k: c.stiffness, m }
}

/**
 * The reference: ml-matrix's EigenvalueDecomposition (npm ml-matrix 6.15, the EISPACK tred2/tql2
 * pair) of M^-½ K M^-½, mapped back and signed as the engine documents (largest |v| positive,
 * the first of those equal within 1e-9) — the engine's solver before this one.
 */
export function referenceModes(k: Float64Array, mass: Float64Array): Modes {
  const n = mass.length
  const s = Array.from(mass, (x) => 1 / Math.sqrt(x))
  const a = Matrix.from1DArray(
    n,
    n,
    Array.from(k, (v, i) => v * s[Math.floor(i / n)]! * s[i % n]!),
  )
  const evd = new EigenvalueDecomposition(a, { assumeSymmetric: true })
  const values = evd.realEigenvalues
  const vectors = evd.eigenvectorMatrix
  const order = values.map((_, i) => i).sort((p, q) => values[p]! - values[q]!)
  const omega = new Float64Array(n)
  const phi = new Float64Array(n * n)
  order.forEach((src, i) => {
    omega[i] = Math.sqrt(Math.max(values[src]!, 0))
    let big = 0
    for (let r = 0; r < n; r++) {
      const v = vectors.get(r, src)
      if (Math.abs(v) > Math.abs(big) * (1 + 1e-9)) big = v
    }
    const sign = big < 0 ? -1 : 1
    for (let r = 0; r < n; r++) phi[r * n + i] = sign * vectors.get(r, src) * s[r]!
  })
  return { n, omega, phi }
}

/** Largest |ΦᵀMΦ − I| entry. */
export function orthogonalityError(modes: Modes, mass: Float64Array): number {
  const { n, phi } = modes
  const g = new Float64Array(n * n)
  for (let r = 0; r < n; r++) {
    const m = mass[r]!
    for (let i = 0; i < n; i++) {
      const x = m * phi[r * n + i]!
      for (let j = i; j < n; j++) g[i * n + j] = g[i * n + j]! + x * phi[r * n + j]!
    }
  }
  let worst = 0
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) worst = Math.max(worst, Math.abs(g[i * n + j]! - (i === j ? 1 : 0)))
  }
  return worst
}

/** Largest ‖Kφ − ω²Mφ‖ / ‖Kφ‖ over the modes. */
export function residualError(modes: Modes, k: Float64Array, mass: Float64Array): number {
  const { n, phi, omega } = modes
  const kphi = new Float64Array(n * n)
  for (let r = 0; r < n; r++) {
    for (let c = 0; c < n; c++) {
      const krc = k[r * n + c]!
      if (krc === 0) continue
      for (let i = 0; i < n; i++) kphi[r * n + i] = kphi[r * n + i]! + krc * phi[c * n + i]!
    }
  }
  let worst = 0
  for (let i = 0; i < n; i++) {
    let num = 0
    let den = 0
    const w2 = omega[i]! ** 2
    for (let r = 0; r < n; r++) {
      const kp = kphi[r * n + i]!
      num += (kp - w2 * mass[r]! * phi[r * n + i]!) ** 2
      den += kp * kp
    }
    worst = Math.max(worst, Math.sqrt(num / den))
  }
  return worst
}

/** Modal assurance criterion |aᵀb|² / ((aᵀa)(bᵀb)) of mode i of two solutions (Allemang 2003). */
export function mac(a: Modes, b: Modes, i: number): number {
  let ab = 0
  let aa = 0
  let bb = 0
  for (let r = 0; r < a.n; r++) {
    const x = a.phi[r * a.n + i]!
    const y = b.phi[r * b.n + i]!
    ab += x * y
    aa += x * x
    bb += y * y
  }
  return (ab * ab) / (aa * bb)
}

/**
 * How much of mode i of `a` lies in the span of modes `from`…`to` of `b` (M-orthonormal):
 * Σ_j (φ_bjᵀ M φ_ai)², 1 when it lies wholly inside.
 */
export function shareInSpan(
  a: Modes,
  b: Modes,
  mass: Float64Array,
  i: number,
  from: number,
  to: number,
) {
  let total = 0
  for (let j = from; j <= to; j++) {
    let dot = 0
    for (let r = 0; r < a.n; r++) dot += b.phi[r * a.n + j]! * mass[r]! * a.phi[r * a.n + i]!
    total += dot * dot
  }
  return total
}

/** Groups of mode indices whose ω² lie within `gap` (relative to the largest) of a neighbour. */
export function clusters(omega: Float64Array, gap: number): Array<[number, number]> {
  const top = omega[omega.length - 1]! ** 2
  const out: Array<[number, number]> = []
  let from = 0
  for (let i = 1; i <= omega.length; i++) {
    if (i === omega.length || omega[i]! ** 2 - omega[i - 1]! ** 2 > gap * top) {
      out.push([from, i - 1])
      from = i
    }
  }
  return out
}
