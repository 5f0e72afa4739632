/**
 * inverseApproximation: an odd real polynomial p with p(x) ≈ scale/x for δ ≤ |x| ≤ 1 and |p| ≤ supTarget
 * on [−1, 1], the polynomial a QSVT inverse needs. Construction: the truncated Chebyshev series of
 * g_b(x) = (1 − (1 − x²)^b)/x (Childs, Kothari & Somma, SIAM J. Comput. 46, 1920 (2017)), b the
 * smallest integer with (1 − δ²)^b/δ ≤ ¾ε, truncated at the smallest odd degree whose CERTIFIED error
 * is ≤ ε, never beyond the paper's truncation index j0 = ⌈√(b ln(16b/ε))⌉ (inverseSeriesPlan), then
 * scaled by scale = supTarget / (measured sup of q). The degree is O((1/δ) log(1/(δε))).
 *
 * Certified error (a proof, not a measurement): for δ ≤ |x| ≤ 1 and q the truncation of g_b after T_j,
 *   |q(x) − 1/x| ≤ |g_b(x) − 1/x| + |g_b(x) − q(x)| ≤ (1 − δ²)^b/δ + Σ_{k>j} |c_k|
 * since |T_k| ≤ 1 on [−1, 1]; plus a bound on the rounding of the computed coefficients (computed in double-double
 * and rounded once, inverseSeriesCoefficients / inverseSeriesRounding) and of the final scaling.
 * errorBound = scale × that. maxError, the value measured on a first-kind Chebyshev grid of 16 points
 * per degree plus ±δ and ±1, is reported beside it and never exceeds it; supNorm is measured the same way.
 *
 * Error definition: ε bounds the error of the implied approximation of 1/x, |p(x)/scale − 1/x| ≤ ε
 * for δ ≤ |x| ≤ 1, so errorBound = scale·(certified error) ≤ ε·scale.
 */
import type { ChebyshevSeries } from './ChebyshevSeries.js';
import { inverseSeriesCoefficients, inverseSeriesRounding } from './internal/inverseSeriesCoefficients.js';
import { defaultGridSize, maxOnChebyshevGrid } from './internal/maxOnChebyshevGrid.js';

export interface InverseApproximation {
  /** Odd, real. */
  readonly polynomial: ChebyshevSeries;
  /** The approximation holds for δ ≤ |x| ≤ 1. */
  readonly delta: number;
  /** p(x) ≈ scale/x for δ ≤ |x| ≤ 1; scale < δ, so that |p| < 1 on [−1, 1]. */
  readonly scale: number;
  /** Rigorous bound on max over δ ≤ |x| ≤ 1 of |p(x) − scale/x| (≤ ε·scale). */
  readonly errorBound: number;
  /** The same maximum measured on the grid (≤ errorBound), for reporting. */
  readonly maxError: number;
  /** max over [−1, 1] of |p(x)|, measured the same way (= supTarget up to rounding). */
  readonly supNorm: number;
  /** Odd. */
  readonly degree: number;
}

export interface InverseApproximationOptions {
  /** Largest degree allowed; default 100,000. */
  readonly maxDegree?: number;
  /** The sup-norm of p on [−1, 1], in (0, 1); default 1/2. */
  readonly supTarget?: number;
}

/** Share of ε given to the error of g_b itself; the rest is for the truncation. */
const FUNCTION_SHARE = 0.75;

/** b and the Childs–Kothari–Somma truncation index j0 (Lemmas 17–19) for δ and ε: degree 2·j0 + 1 always meets ε. */
export function inverseSeriesPlan(delta: number, epsilon: number): { readonly b: number; readonly boundIndex: number } {
  const b = Math.max(1, Math.ceil(Math.log(1 / (delta * FUNCTION_SHARE * epsilon)) / -Math.log1p(-delta * delta)));
  const truncationBudget = (1 - FUNCTION_SHARE) * epsilon;
  return { b, boundIndex: Math.min(b - 1, Math.ceil(Math.sqrt(b * Math.log((4 * b) / truncationBudget)))) };
}

/**
 * @param delta δ in (0, 1): the smallest |x| where the approximation must hold.
 * @param epsilon ε in (0, 1): bound on |p(x)/scale − 1/x| for δ ≤ |x| ≤ 1.
 * @throws RangeError naming the value for δ or ε outside (0, 1), a supTarget outside (0, 1), or when
 *   the degree needed exceeds maxDegree.
 */
export function inverseApproximation(delta: number, epsilon: number, options: InverseApproximationOptions = {}): InverseApproximation {
  const maxDegree = options.maxDegree ?? 100_000;
  const supTarget = options.supTarget ?? 0.5;
  if (!(delta > 0 && delta < 1)) throw new RangeError(`inverseApproximation: delta must be in (0, 1), got ${delta}`);
  if (!(epsilon > 0 && epsilon < 1)) throw new RangeError(`inverseApproximation: epsilon must be in (0, 1), got ${epsilon}`);
  if (!(supTarget > 0 && supTarget < 1)) throw new RangeError(`inverseApproximation: supTarget must be in (0, 1), got ${supTarget}`);
  if (!Number.isInteger(maxDegree) || maxDegree < 1) throw new RangeError(`inverseApproximation: maxDegree must be a positive integer, got ${maxDegree}`);

  const { b, boundIndex } = inverseSeriesPlan(delta, epsilon);
  const capIndex = Math.floor((maxDegree - 1) / 2);
  const topIndex = Math.min(boundIndex, capIndex);
  if (topIndex < 0) throw new RangeError(`inverseApproximation: maxDegree ${maxDegree} leaves no odd degree`);
  const certified = certifiedErrors(b, delta, topIndex);
  const passing = certified.errors.findIndex((e) => e <= epsilon);
  if (passing < 0) {
    const topError = certified.errors[topIndex]!;
    if (topIndex === boundIndex) {
      throw new RangeError(
        `inverseApproximation: epsilon = ${epsilon} is below what double precision reaches for delta = ${delta} ` +
          `(certified error ${topError} at degree ${2 * topIndex + 1})`,
      );
    }
    throw new RangeError(`inverseApproximation: delta = ${delta}, epsilon = ${epsilon} need a degree beyond maxDegree = ${maxDegree}`);
  }
  const degree = 2 * passing + 1;
  const unscaled: ChebyshevSeries = { parity: 'odd', coefficients: certified.coefficients.slice(0, degree + 1) };
  const points = defaultGridSize(degree);
  const scale = supTarget / maxOnChebyshevGrid(unscaled, (_x, value) => Math.abs(value), 0, points);
  const polynomial: ChebyshevSeries = { parity: 'odd', coefficients: unscaled.coefficients.map((c) => c * scale) };
  const measured = maxOnChebyshevGrid(polynomial, (x, value) => Math.abs(value - scale / x), delta, points);
  // Scaling rounds each coefficient once more: |p − scale·q̃| ≤ 2⁻⁵³·scale·Σ|c̃_k|.
  let coefficientSum = 0;
  for (const c of unscaled.coefficients) coefficientSum += Math.abs(c);
  const errorBound = (certified.errors[passing]! + coefficientSum * 2 ** -52) * scale * (1 + 2 ** -50);
  return { polynomial, delta, scale, errorBound, maxError: measured, supNorm: maxOnChebyshevGrid(polynomial, (_x, value) => Math.abs(value), 0, points), degree };
}

/**
 * The coefficients of g_b up to degree 2·topIndex + 1 and, for each truncation index j ≤ topIndex, the certified
 * max_{δ≤|x|≤1} |q̃_j(x) − 1/x| of the computed truncation q̃_j after T_{2j+1}. With q_j the exact truncation, E_j =
 * (1 − δ²)^b/δ + Σ_{k>j}|c_k| bounds |q_j − 1/x|, and q̃_j = (1 + η)(q_j + Σ_{k≤j} θ_k c_k T_k) (inverseSeriesRounding)
 * adds |η|·|q_j(x)| ≤ |η|(1/δ + E_j) and (1 + |η|)·max|θ|·Σ_{k≤j}|c_k|; |c_k| ≤ |c̃_k|(1 + 2(|η| + max|θ|)).
 */
function certifiedErrors(b: number, delta: number, topIndex: number): { coefficients: Float64Array; errors: Float64Array } {
  const { terms, common, relative, beyondComputed } = inverseSeriesRounding(b);
  const series = inverseSeriesCoefficients(b, Math.max(2 * topIndex + 1, 2 * terms - 1));
  const functionError = Math.exp(b * Math.log1p(-delta * delta)) / delta;
  const enlarge = 1 + 2 * (common + relative);
  // The sums below add up to `terms` positive doubles: relative error ≤ terms·2⁻⁵³ (Higham, 2nd ed., §4.2, from memory).
  const summation = 1 + (terms + 8) * 2 ** -52;
  const lastIndex = (series.length - 2) / 2;
  const errors = new Float64Array(topIndex + 1);
  let dropped = 0;
  for (let j = lastIndex; j > topIndex; j--) dropped += Math.abs(series[2 * j + 1]!);
  let kept = 0;
  for (let j = 0; j <= topIndex; j++) kept += Math.abs(series[2 * j + 1]!);
  for (let j = topIndex; j >= 0; j--) {
    const exactError = functionError + (dropped * enlarge + beyondComputed) * summation;
    const rounding = common * (1 / delta + exactError) + (1 + common) * relative * kept * enlarge * summation;
    errors[j] = (exactError + rounding) * summation;
    const c = Math.abs(series[2 * j + 1]!);
    dropped += c;
    kept = Math.max(0, kept - c);
  }
  return { coefficients: series.subarray(0, 2 * topIndex + 2), errors };
}
