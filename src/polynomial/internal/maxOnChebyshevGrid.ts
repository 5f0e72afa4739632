/**
 * maxOnChebyshevGrid: the largest value of measure(x, p(x)) over a first-kind Chebyshev grid restricted
 * to |x| ≥ lowerBound, plus the points ±1 and ±lowerBound; the values come from one FFT-based DCT.
 */
import type { ChebyshevSeries } from '../ChebyshevSeries.js';
import { evaluateChebyshev } from '../evaluateChebyshev.js';
import { chebyshevPoints, chebyshevValues, powerOfTwoAtLeast } from './chebyshevTransforms.js';

/** The default grid: at least 16 points per degree, a power of two. */
export function defaultGridSize(degree: number): number {
  return powerOfTwoAtLeast(16 * (degree + 1));
}

/** @param points grid size, rounded up to a power of two and to at least the number of coefficients. */
export function maxOnChebyshevGrid(
  p: ChebyshevSeries,
  measure: (x: number, value: number) => number,
  lowerBound: number,
  points: number,
): number {
  const count = powerOfTwoAtLeast(Math.max(points, p.coefficients.length));
  const grid = chebyshevPoints(count);
  const values = chebyshevValues(p.coefficients, count);
  let largest = 0;
  for (let l = 0; l < count; l++) {
    if (Math.abs(grid[l]!) >= lowerBound) largest = Math.max(largest, measure(grid[l]!, values[l]!));
  }
  for (const x of [1, -1, lowerBound, -lowerBound]) {
    if (x !== 0) largest = Math.max(largest, measure(x, evaluateChebyshev(p, x)));
  }
  return largest;
}
