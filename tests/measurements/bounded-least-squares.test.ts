import { describe, expect, it } from 'vitest'
import { boundedLeastSquares } from '../../shared/updating/bounded-least-squares'

// Bounded-variable least squares (Stark & Parker, Computational Statistics 10, 1995):
// hand-checked cases.
describe('boundedLeastSquares', () => {
  /** A = [[1, 1], [1, −1]], b = [2, 0] with x ≥ (−5, −5) and x ≤ upper. */
  const crossed = (upper: number[]) =>
    boundedLeastSquares(
      [
        [1, 1],
        [1, -1],
      ],
      [2, 0],
      [-5, -5],
      upper,
    )

  it('returns the unconstrained solution when it lies inside the box', () => {
    // the least-squares solution x = (1, 1) lies inside the box
    const { x, atBound } = crossed([5, 5])
    expect(x).toEqual([expect.closeTo(1, 12), expect.closeTo(1, 12)])
    expect(atBound).toEqual([false, false])
  })

  it('fixes a variable at its bound and re-solves the others', () => {
    // with x₁ ≤ 0.5: minimise (x₂ − 1.5)² + (0.5 − x₂)² → x₂ = 1
    const { x, atBound } = crossed([0.5, 5])
    expect(x).toEqual([0.5, expect.closeTo(1, 12)])
    expect(atBound).toEqual([true, false])
  })

  it('projects a separable problem onto the box corner', () => {
    const { x } = boundedLeastSquares(
      [
        [1, 0],
        [0, 1],
      ],
      [2, -3],
      [-1, -1],
      [1, 1],
    )
    expect(x).toEqual([1, -1])
  })

  it('gives the minimum-norm solution of a rank-deficient problem', () => {
    // x₁ + x₂ = 2 has many solutions; the shortest is (1, 1)
    const { x } = boundedLeastSquares([[1, 1]], [2], [-5, -5], [5, 5])
    expect(x).toEqual([expect.closeTo(1, 12), expect.closeTo(1, 12)])
  })
})
