/** One connected group of rows of a symmetric matrix, in a bandwidth-reducing order. */
export interface Component {
  /** global row indices, in reverse Cuthill–McKee order */
  order: number[]
  /** half-bandwidth of the component in that order */
  bandwidth: number
}

/**
 * Splits the graph of a symmetric matrix (an edge where A_ij ≠ 0) into connected components and
 * orders each by reverse Cuthill–McKee from a pseudo-peripheral node (Cuthill & McKee, Proc.
 * 24th ACM National Conference, 1969; George & Liu, Computer Solution of Large Sparse Positive
 * Definite Systems, 1981, §4.3–4.4). Chains, spans and storeys come out with a small bandwidth.
 * @param matrix row-major n×n
 * @param n order
 */
export function reverseCuthillMcKee(matrix: Float64Array, n: number): Component[] {
  const adjacency: number[][] = []
  for (let i = 0; i < n; i++) {
    const list: number[] = []
    for (let j = 0; j < n; j++) if (j !== i && matrix[i * n + j] !== 0) list.push(j)
    adjacency.push(list)
  }
  const degree = (i: number): number => adjacency[i]!.length
  for (const list of adjacency) list.sort((p, q) => degree(p) - degree(q) || p - q)
  const seen = new Uint8Array(n)
  const components: Component[] = []
  for (let i = 0; i < n; i++) {
    if (seen[i]) continue
    const members = levels(adjacency, i).flat()
    const start = peripheral(
      adjacency,
      members.reduce((a, x) => (degree(x) < degree(a) ? x : a)),
    )
    const order = levels(adjacency, start).flat().reverse()
    for (const x of order) seen[x] = 1
    components.push({ order, bandwidth: bandwidth(adjacency, order) })
  }
  return components
}

/**
 * Breadth-first level structure from a root, each level's nodes taken in the order their
 * parents were reached and, within a parent, by ascending degree (the Cuthill–McKee rule).
 */
function levels(adjacency: number[][], root: number): number[][] {
  const seen = new Set<number>([root])
  const result = [[root]]
  for (;;) {
    const next: number[] = []
    for (const x of result[result.length - 1]!) {
      for (const y of adjacency[x]!) {
        if (seen.has(y)) continue
        seen.add(y)
        next.push(y)
      }
    }
    if (next.length === 0) return result
    result.push(next)
  }
}

/** A node of (nearly) largest eccentricity, by George & Liu's repeated level-structure search. */
function peripheral(adjacency: number[][], start: number): number {
  let root = start
  let depth = levels(adjacency, root).length
  for (;;) {
    const last = levels(adjacency, root).at(-1)!
    const candidate = last.reduce((a, x) => (adjacency[x]!.length < adjacency[a]!.length ? x : a))
    const d = levels(adjacency, candidate).length
    if (d <= depth) return root
    root = candidate
    depth = d
  }
}

function bandwidth(adjacency: number[][], order: number[]): number {
  const position = new Map(order.map((x, i) => [x, i]))
  let b = 0
  order.forEach((x, i) => {
    for (const y of adjacency[x]!) b = Math.max(b, Math.abs(i - position.get(y)!))
  })
  return b
}
