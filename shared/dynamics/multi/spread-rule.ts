import type { Tuning } from '../closed-forms'

/**
 * Starting tunings for n units spread around one mode, total mass ratio μ_T: the uniform-spread
 * arrangement analysed by Xu & Igusa (EESD 21, 1992) and Yamaguchi & Harnpornchai (EESD 22,
 * 1993) (memory) — natural frequencies evenly spaced about a centre, equal damping ratios — with
 * the centre at Den Hartog's frequency for the total mass, f_c = 1/(1+μ_T), the frequencies spread
 * over the width of the two split peaks of one absorber of that mass, f_c(1 ± √(μ_T/2))
 * (Den Hartog, Mechanical Vibrations, 1956), and each unit given Den Hartog's damping for its own
 * mass ratio μ_T/n. The centre and damping follow Den Hartog; the width is common practice, not a
 * published optimum — the joint search starts here and never returns worse.
 * @param n number of units (≥ 1)
 * @param muTotal Σ m_j / m_eff of the mode (–)
 * @param width total spread as a fraction of f_c (default √(2μ_T), i.e. ±√(μ_T/2))
 * @returns one tuning per unit, frequency ratio ascending
 */
export function spreadRule(n: number, muTotal: number, width = Math.sqrt(2 * muTotal)): Tuning[] {
  const centre = 1 / (1 + muTotal)
  const mu = muTotal / n
  const dampingRatio = Math.sqrt((3 * mu) / (8 * (1 + mu)))
  return Array.from({ length: n }, (_, j) => ({
    frequencyRatio: centre * (1 + (n > 1 ? width * (j / (n - 1) - 0.5) : 0)),
    dampingRatio,
  }))
}
