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
import { ddAdd, ddDivide, ddTimes, type DoubleDouble } from './doubleDouble.js';

/** Above this b, t_0 comes from Stirling's series in double precision instead of the exact product. */
const PRODUCT_LIMIT = 2000;
const UNIT = 2 ** -53;

/** C(2b, b)/4^b: the exact product Π (2k−1)/(2k) in double-double for small b, else its asymptotic series. */
function centralBinomialWeight(b: number): DoubleDouble {
  if (b <= PRODUCT_LIMIT) {
    let weight: DoubleDouble = { hi: 1, lo: 0 };
    for (let k = 1; k <= b; k++) weight = ddDivide(ddTimes(weight, 2 * k - 1), 2 * k);
    return weight;
  }
  // ln(C(2b,b) √(πb) / 4^b) = −1/(8b) + 1/(192 b³) + O(b⁻⁵) (Stirling's series; common practice).
  return { hi: Math.exp(-1 / (8 * b) + 1 / (192 * b ** 3)) / Math.sqrt(Math.PI * b), lo: 0 };
}

/** Binomial weights summed for b: beyond them every weight is below 1e-300 (Chernoff: t_i/t_0 ≤ e^{−i²/b}). */
function termCount(b: number): number {
  return Math.min(b, Math.ceil(27 * Math.sqrt(b)) + 2);
}

/**
 * How far the computed coefficients c̃_k can be from the true c_k of g_b: c̃_k = (1 + η)·c_k·(1 + θ_k) with |η| ≤
 * `common` (t_0's error, shared by every coefficient: ~2⁻¹⁰⁰ from the double-double product, or for b > 2000 the
 * asymptotic series' 1e-17 plus ≤ 6 roundings of exp, sqrt and the divisions) and |θ_k| ≤ `relative` (the final rounding
 * to double, 2⁻⁵³, plus the double-double recurrence and sums, a few 2⁻¹⁰⁴ per step; Hida, Li & Bailey 2001, from
 * memory); `beyondComputed` bounds Σ |c_k| over the coefficients not computed (4·b²·e^{−terms²/b}, Chernoff's bound on
 * the binomial tail as in Childs, Kothari & Somma, Lemma 19, plus terms·1e-290 for weights so small that their low part
 * underflows). `terms` is the number of weights summed.
 */
export function inverseSeriesRounding(b: number): {
  readonly terms: number;
  readonly common: number;
  readonly relative: number;
  readonly beyondComputed: number;
} {
  const terms = termCount(b);
  const common = b <= PRODUCT_LIMIT ? 8 * b * 2 ** -104 : 1e-17 + 6 * UNIT;
  return {
    terms,
    common,
    relative: UNIT + (16 * terms + 16) * 2 ** -104,
    beyondComputed: (terms < b ? 4 * b * b * Math.exp(-(terms * terms) / b) : 0) + terms * 1e-290,
  };
}

/**
 * The coefficients of T_0 … T_degree of g_b (even entries 0), truncated at `degree` (odd), computed in double-double
 * and rounded once.
 * @throws RangeError for a non-positive or non-integer b.
 */
export function inverseSeriesCoefficients(b: number, degree: number): Float64Array {
  if (!Number.isInteger(b) || b < 1) throw new RangeError(`inverseSeriesCoefficients: b must be a positive integer, got ${b}`);
  const terms = termCount(b);
  ensureFits(16 * (terms + 1) + 8 * (degree + 1), `the Chebyshev coefficients of the 1/x approximation (b = ${b})`);
  const weightsHi = new Float64Array(terms + 1);
  const weightsLo = new Float64Array(terms + 1);
  let weight = centralBinomialWeight(b);
  weightsHi[0] = weight.hi;
  weightsLo[0] = weight.lo;
  for (let i = 0; i < terms; i++) {
    weight = ddDivide(ddTimes(weight, b - i), b + i + 1);
    weightsHi[i + 1] = weight.hi;
    weightsLo[i + 1] = weight.lo;
  }
  // tail = Σ_{i=j+1}^{terms} t_i, summed from the small end.
  const coefficients = new Float64Array(degree + 1);
  let tail: DoubleDouble = { hi: 0, lo: 0 };
  for (let i = terms; i >= 1; i--) {
    tail = ddAdd(tail, { hi: weightsHi[i]!, lo: weightsLo[i]! });
    const j = i - 1;
    if (2 * j + 1 <= degree) coefficients[2 * j + 1] = 4 * (j % 2 === 0 ? tail.hi + tail.lo : -(tail.hi + tail.lo));
  }
  return coefficients;
}
