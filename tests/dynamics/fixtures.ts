import type { ModelInput } from '../../shared/schemas/model'
import { seeded } from '../helpers/random'

export { seeded }

/** n equal masses m on equal springs k; both ends fixed (n+1 springs) or the far end free. */
export function chainModel(n: number, m: number, k: number, bothEnds: boolean): ModelInput {
  const ids = ['ground', ...Array.from({ length: n }, (_, i) => `m${i + 1}`)]
  const nodes = ids.map((id, i) => (i === 0 ? { id, fixed: true } : { id, mass: m }))
  const springs = ids.slice(1).map((to, i) => ({ from: ids[i] ?? '', to, stiffness: k }))
  if (bothEnds) {
    nodes.push({ id: 'end', fixed: true })
    springs.push({ from: `m${n}`, to: 'end', stiffness: k })
  }
  return { nodes, springs }
}

/** A random connected network: a spanning chain from the support plus random extra springs. */
export function randomNetwork(rnd: () => number, n: number, dashpots: boolean): ModelInput {
  const nodes = [
    { id: 'g', fixed: true },
    ...Array.from({ length: n }, (_, i) => ({ id: `n${i}`, mass: 50 + 950 * rnd() })),
  ]
  const springs = Array.from({ length: n }, (_, i) => ({
    from: i === 0 ? 'g' : `n${Math.floor(rnd() * i)}`,
    to: `n${i}`,
    stiffness: 1e5 + 1e6 * rnd(),
    damping: dashpots ? 200 * rnd() : 0,
  }))
  for (let e = 0; e < n; e++) {
    const a = Math.floor(rnd() * n)
    const b = Math.floor(rnd() * n)
    if (a !== b)
      springs.push({
        from: `n${a}`,
        to: `n${b}`,
        stiffness: 1e5 * rnd() + 1,
        damping: dashpots ? 50 * rnd() : 0,
      })
  }
  springs.push({ from: `n${n - 1}`, to: 'g', stiffness: 3e5 * rnd() + 1, damping: 0 })
  return { nodes, springs }
}

/** The undamped-host single-mode model used by the tuning checks: M = 1 kg, ω_n = 1 rad/s. */
export function unitOscillator(
  zetaHost: number,
  mu: number,
  tuning: NonNullable<ModelInput['absorber']>['tuning'],
): ModelInput {
  return {
    nodes: [
      { id: 'ground', fixed: true },
      { id: 'host', mass: 1 },
    ],
    springs: [{ from: 'ground', to: 'host', stiffness: 1 }],
    hostDampingRatio: zetaHost,
    absorber: { node: 'host', massRatio: mu, tuning },
  }
}

/**
 * A two-way floor lumped into nx × ny equal masses on a grid of springs, fixed on all four edges,
 * with the spring rates chosen so that mode 2 lies 10 % above mode 1 (f1 Hz): for the lumped
 * membrane λ_pq = (4k_x/m) sin²(pπ/(2(nx+1))) + (4k_y/m) sin²(qπ/(2(ny+1))) (separable
 * fixed–fixed chains), so λ_21/λ_11 = 1.21 fixes k_y/k_x. Node ids "p<i>-<j>", support "edge".
 */
export function closeModeFloor(nx = 20, ny = 10, m = 500, f1 = 5): ModelInput {
  const s = (p: number, count: number): number => Math.sin((p * Math.PI) / (2 * (count + 1))) ** 2
  const ratio = (s(2, nx) - 1.21 * s(1, nx)) / (0.21 * s(1, ny))
  const kx = (m * (2 * Math.PI * f1) ** 2) / (4 * (s(1, nx) + ratio * s(1, ny)))
  const id = (i: number, j: number): string =>
    i < 1 || i > nx || j < 1 || j > ny ? 'edge' : `p${i}-${j}`
  const nodes: ModelInput['nodes'] = [{ id: 'edge', fixed: true }]
  const springs: ModelInput['springs'] = []
  for (let j = 1; j <= ny; j++) {
    for (let i = 1; i <= nx; i++) nodes.push({ id: id(i, j), mass: m })
    for (let i = 0; i <= nx; i++) springs.push({ from: id(i, j), to: id(i + 1, j), stiffness: kx })
  }
  for (let i = 1; i <= nx; i++)
    for (let j = 0; j <= ny; j++)
      springs.push({ from: id(i, j), to: id(i, j + 1), stiffness: ratio * kx })
  return { nodes, springs }
}
