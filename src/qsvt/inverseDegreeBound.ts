/**
 * inverseDegreeBound: the degree that Childs, Kothari & Somma's truncated series for 1/x is guaranteed to need
 * (SIAM J. Comput. 46, 1920, 2017, Lemmas 17–19): g_b(x) = (1 − (1 − x²)^b)/x is ¾ε-close to 1/x on δ ≤ |x| ≤ 1 once
 * (1 − δ²)^b/δ ≤ ¾ε, and its Chebyshev series truncated after index j0 = ⌈√(b ln(4b/ε'))⌉ is within ε' = ¼ε of it; the
 * degree is 2 j0 + 1. inverseApproximation uses the same b and never goes beyond j0 (inverseSeriesPlan), so this is an
 * upper bound on its degree, for costing without building the polynomial.
 */
import { inverseSeriesPlan } from '../polynomial/inverseApproximation.js';

export function inverseDegreeBound(delta: number, epsilon: number): number {
  if (!(delta > 0 && delta < 1)) throw new RangeError(`inverseDegreeBound: delta must be in (0, 1), got ${delta}`);
  if (!(epsilon > 0 && epsilon < 1)) throw new RangeError(`inverseDegreeBound: epsilon must be in (0, 1), got ${epsilon}`);
  return 2 * inverseSeriesPlan(delta, epsilon).boundIndex + 1;
}
