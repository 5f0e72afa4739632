/**
 * inverseDegreeBound: the degree that Childs, Kothari & Somma's truncated series for 1/x is guaranteed to need
 * (SIAM J. Comput. 46, 1920, 2017, Lemmas 17–19): g_b(x) = (1 − (1 − x²)^b)/x is ε/…-close to 1/x on δ ≤ |x| ≤ 1 once
 * (1 − δ²)^b/δ ≤ ¾ε, and its Chebyshev series truncated after index j0 = ⌈√(b ln(4b/ε'))⌉ is within ε' = ¼ε of it; the
 * degree is 2 j0 + 1. The same split as inverseApproximation, which bisects below this bound for the smallest degree that
 * meets ε, so this is an upper bound on its degree, for costing without building the polynomial.
 */
export function inverseDegreeBound(delta: number, epsilon: number): number {
  if (!(delta > 0 && delta < 1)) throw new RangeError(`inverseDegreeBound: delta must be in (0, 1), got ${delta}`);
  if (!(epsilon > 0 && epsilon < 1)) throw new RangeError(`inverseDegreeBound: epsilon must be in (0, 1), got ${epsilon}`);
  const b = Math.max(1, Math.ceil(Math.log(1 / (delta * 0.75 * epsilon)) / -Math.log1p(-delta * delta)));
  const j0 = Math.min(b - 1, Math.ceil(Math.sqrt(b * Math.log((4 * b) / (0.25 * epsilon)))));
  return 2 * j0 + 1;
}
