/** Internal shapes shared by the engine's modules. Vectors and matrices are Float64Array,
 * matrices row-major n×n; complex vectors keep real and imaginary parts apart for speed. */

/** A complex vector stored as two real arrays of the same length. */
export interface ComplexArray {
  re: Float64Array
  im: Float64Array
}

/** A spring after validation, referring to free-node indices (−1 = grounded end). */
export interface ValidSpring {
  a: number
  b: number
  /** N/m */
  stiffness: number
  /** N·s/m */
  damping: number
}

/** A host model after validation: only free nodes carry degrees of freedom. */
export interface ValidHost {
  /** ids of the free nodes, in degree-of-freedom order */
  ids: string[]
  /** kg, one per free node (0 for a massless node) */
  mass: Float64Array
  /** indices of the massless free nodes, condensed statically */
  massless: number[]
  springs: ValidSpring[]
  /** true when some spring has a dashpot (damping is then non-classical) */
  hasDashpots: boolean
}

/** Undamped modes of a host, mass-normalised (φᵀMφ = 1). */
export interface Modes {
  n: number
  /** rad/s, ascending */
  omega: Float64Array
  /** row-major n×n; column i is mode i: phi[a * n + i] */
  phi: Float64Array
}

/** Absorber parameters in SI units. */
export interface AbsorberParams {
  /** index of the host degree of freedom it sits on */
  node: number
  /** for an absorber acting between two nodes: the second one (its inertance reacts on it) */
  relativeTo?: number
  /** kg */
  mass: number
  /** N/m */
  stiffness: number
  /** N·s/m */
  damping: number
}
