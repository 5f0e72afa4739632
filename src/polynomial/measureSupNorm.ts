/**
 * measureSupNorm: max |p(x)| over [−1, 1] measured on a fine first-kind Chebyshev grid (values by an
 * FFT-based DCT) plus the end points ±1. A measurement, not a bound: between grid points the true
 * maximum may exceed it by a relative amount of order (π·degree / points)² / 8, about 0.5 % on the
 * default grid of 16 points per degree.
 */
import type { ChebyshevSeries } from './ChebyshevSeries.js';
import { defaultGridSize, maxOnChebyshevGrid } from './internal/maxOnChebyshevGrid.js';

/**
 * @param points grid size (rounded up to a power of two); default 16·(degree + 1).
 * @throws RangeError when points is not a positive integer.
 */
export function measureSupNorm(p: ChebyshevSeries, points?: number): number {
  const count = points ?? defaultGridSize(p.coefficients.length - 1);
  if (!Number.isInteger(count) || count < 1) throw new RangeError(`measureSupNorm: points must be a positive integer, got ${count}`);
  return maxOnChebyshevGrid(p, (_x, value) => Math.abs(value), 0, count);
}
