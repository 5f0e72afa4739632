/**
 * inverseSeriesCoefficients: the Chebyshev coefficients of g_b(x) = (1 − (1 − x²)^b)/x, which is odd,
 * equals 1/x up to (1 − x²)^b/|x| and is a polynomial of degree 2b − 1:
 *   g_b(x) = 4 Σ_{j=0}^{b−1} (−1)^j [Σ_{i=j+1}^{b} C(2b, b+i) / 2^{2b}] T_{2j+1}(x)
 * (Childs, Kothari & Somma, SIAM J. Comput. 46, 1920 (2017), the Chebyshev expansion of their
 * approximation of 1/x; Lemma 14 of arXiv:1511.02306). The binomial weights t_i = C(2b, b+i)/4^b come
 * from t_0 = C(2b, b)/4^b and t_{i+1} = t_i (b − i)/(b + i + 1); they fall below 1e-300 after about
 * 26·√b terms, so only those are summed.
 */
import { ensureFits } from '../../core/memoryBudget.js';

/** C(2b, b)/4^b: the exact product Π (2k−1)/(2k) for small b, else its asymptotic series (error < 1e-17). */
function centralBinomialWeight(b: number): number {
  if (b <= 2000) {
    let weight = 1;
    for (let k = 1; k <= b; k++) weight *= (2 * k - 1) / (2 * k);
    return weight;
  }
  // ln(C(2b,b) √(πb) / 4^b) = −1/(8b) + 1/(192 b³) + O(b⁻⁵) (Stirling's series; common practice).
  return Math.exp(-1 / (8 * b) + 1 / (192 * b ** 3)) / Math.sqrt(Math.PI * b);
}

/**
 * The coefficients of T_0 … T_degree of g_b (even entries 0), truncated at `degree` (odd).
 * @throws RangeError for a non-positive or non-integer b.
 */
export function inverseSeriesCoefficients(b: number, degree: number): Float64Array {
  if (!Number.isInteger(b) || b < 1) throw new RangeError(`inverseSeriesCoefficients: b must be a positive integer, got ${b}`);
  const terms = Math.min(b, Math.ceil(27 * Math.sqrt(b)) + 2);
  ensureFits(8 * (terms + degree + 2), `the Chebyshev coefficients of the 1/x approximation (b = ${b})`);
  const weights = new Float64Array(terms + 1);
  weights[0] = centralBinomialWeight(b);
  for (let i = 0; i < terms; i++) weights[i + 1] = (weights[i]! * (b - i)) / (b + i + 1);
  // tails[j] = Σ_{i=j+1}^{terms} t_i, summed from the small end.
  const coefficients = new Float64Array(degree + 1);
  let tail = 0;
  for (let i = terms; i >= 1; i--) {
    tail += weights[i]!;
    const j = i - 1;
    if (2 * j + 1 <= degree) coefficients[2 * j + 1] = 4 * (j % 2 === 0 ? tail : -tail);
  }
  return coefficients;
}
