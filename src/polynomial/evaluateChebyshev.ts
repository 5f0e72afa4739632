/**
 * evaluateChebyshev: the value of a Chebyshev series at one point by Clenshaw's recurrence
 * b_k = c_k + 2x b_{k+1} − b_{k+2}, p(x) = c_0 + x b_1 − b_2 (Clenshaw, Math. Comp. 9, 118, 1955).
 */
import type { ChebyshevSeries } from './ChebyshevSeries.js';

export function evaluateChebyshev(p: ChebyshevSeries, x: number): number {
  const c = p.coefficients;
  if (c.length === 0) return 0;
  const twoX = 2 * x;
  let next = 0;
  let nextNext = 0;
  for (let k = c.length - 1; k >= 1; k--) {
    const current = c[k]! + twoX * next - nextNext;
    nextNext = next;
    next = current;
  }
  return c[0]! + x * next - nextNext;
}
