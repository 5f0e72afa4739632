/**
 * chebyshevInterpolant: a Chebyshev series of a given degree and parity approximating a function on
 * [−1, 1], from its samples at N ≥ 2(degree + 1) first-kind Chebyshev points (N a power of two) through
 * one FFT-based DCT, truncated to the degree. For functions analytic near [−1, 1] the truncation is
 * within a small factor of the best approximation of that degree (Trefethen, Approximation Theory and
 * Approximation Practice, SIAM 2013, Thms. 8.2 and 16.1).
 */
import type { ChebyshevSeries, Parity } from './ChebyshevSeries.js';
import { chebyshevCoefficients, chebyshevPoints, powerOfTwoAtLeast } from './internal/chebyshevTransforms.js';

/**
 * @param f the function, called at points of (−1, 1); for parity 'even' / 'odd' it is called at the
 *   positive points only and extended to x < 0 by f(−x) = ±f(x), and the other parity's coefficients
 *   are exactly 0.
 * @throws RangeError for a negative or non-integer degree, or a non-finite sample.
 */
export function chebyshevInterpolant(f: (x: number) => number, degree: number, parity: Parity = 'none'): ChebyshevSeries {
  if (!Number.isInteger(degree) || degree < 0) throw new RangeError(`chebyshevInterpolant: degree must be a non-negative integer, got ${degree}`);
  const count = powerOfTwoAtLeast(2 * (degree + 1));
  const points = chebyshevPoints(count);
  const values = new Float64Array(count);
  // The points come in ± pairs (l, N−1−l), so a definite parity needs f on one half only.
  for (let l = 0; l < count / 2; l++) {
    const mirror = count - 1 - l;
    const right = f(points[l]!);
    const left = parity === 'none' ? f(points[mirror]!) : parity === 'even' ? right : -right;
    if (!Number.isFinite(right) || !Number.isFinite(left)) throw new RangeError(`chebyshevInterpolant: f is not finite near x = ${points[l]}`);
    values[l] = right;
    values[mirror] = left;
  }
  const coefficients = chebyshevCoefficients(values, degree + 1);
  if (parity !== 'none') for (let k = parity === 'even' ? 1 : 0; k <= degree; k += 2) coefficients[k] = 0;
  return { parity, coefficients };
}
