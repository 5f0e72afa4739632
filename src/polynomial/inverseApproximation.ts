/**
 * inverseApproximation: an odd real polynomial p with p(x) ≈ scale/x for δ ≤ |x| ≤ 1 and |p| ≤ supTarget
 * on [−1, 1], the polynomial a QSVT inverse needs. Construction: the truncated Chebyshev series of
 * g_b(x) = (1 − (1 − x²)^b)/x (Childs, Kothari & Somma, SIAM J. Comput. 46, 1920 (2017)), b the
 * smallest integer with (1 − δ²)^b/δ ≤ ¾ε, truncated at the smallest odd degree whose MEASURED error
 * max_{δ≤|x|≤1} |q(x) − 1/x| is ≤ 0.98ε (the 2 % margin covers what lies between grid points; found by
 * bisection below the paper's truncation bound
 * j0 = ⌈√(b ln(4b/ε'))⌉), then scaled by scale = supTarget / (measured sup of q). The degree is
 * O((1/δ) log(1/(δε))).
 *
 * Error definition: ε bounds the error of the implied approximation of 1/x, |p(x)/scale − 1/x| ≤ ε
 * for δ ≤ |x| ≤ 1, so maxError = max |p(x) − scale/x| ≤ ε·scale. Both maxError and supNorm are
 * measured on a first-kind Chebyshev grid of 16 points per degree plus the points ±δ and ±1.
 */
import type { ChebyshevSeries } from './ChebyshevSeries.js';
import { inverseSeriesCoefficients } from './internal/inverseSeriesCoefficients.js';
import { defaultGridSize, maxOnChebyshevGrid } from './internal/maxOnChebyshevGrid.js';

export interface InverseApproximation {
  /** Odd, real. */
  readonly polynomial: ChebyshevSeries;
  /** The approximation holds for δ ≤ |x| ≤ 1. */
  readonly delta: number;
  /** p(x) ≈ scale/x for δ ≤ |x| ≤ 1; scale < δ, so that |p| < 1 on [−1, 1]. */
  readonly scale: number;
  /** max over δ ≤ |x| ≤ 1 of |p(x) − scale/x|, measured (≤ 0.98·ε·scale). */
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
/** The measured error must stay below this fraction of ε (grid points can miss up to ~0.5 % of a maximum). */
const GRID_MARGIN = 0.98;

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

  const b = Math.max(1, Math.ceil(Math.log(1 / (delta * FUNCTION_SHARE * epsilon)) / -Math.log1p(-delta * delta)));
  const truncationBudget = (GRID_MARGIN - FUNCTION_SHARE) * epsilon;
  // Childs–Kothari–Somma's truncation index: beyond it the tail is ≤ the truncation budget.
  const boundIndex = Math.min(b - 1, Math.ceil(Math.sqrt(b * Math.log((4 * b) / truncationBudget))));
  const capIndex = Math.floor((maxDegree - 1) / 2);
  const topIndex = Math.min(boundIndex, capIndex);
  if (topIndex < 0) throw new RangeError(`inverseApproximation: maxDegree ${maxDegree} leaves no odd degree`);
  const full = inverseSeriesCoefficients(b, 2 * topIndex + 1);
  const errorOf = (index: number): number => measuredInverseError(full.subarray(0, 2 * index + 2), delta);

  const target = GRID_MARGIN * epsilon;
  const topError = errorOf(topIndex);
  if (topError > target) {
    if (topIndex === boundIndex) {
      throw new RangeError(
        `inverseApproximation: epsilon = ${epsilon} is below what double precision reaches for delta = ${delta} ` +
          `(measured error ${topError} at degree ${2 * topIndex + 1})`,
      );
    }
    throw new RangeError(`inverseApproximation: delta = ${delta}, epsilon = ${epsilon} need a degree beyond maxDegree = ${maxDegree}`);
  }
  // Bisection for the smallest truncation index whose measured error meets ε.
  let failing = -1;
  let passing = topIndex;
  while (passing - failing > 1) {
    const middle = (failing + passing) >> 1;
    if (errorOf(middle) <= target) passing = middle;
    else failing = middle;
  }
  const degree = 2 * passing + 1;
  const unscaled: ChebyshevSeries = { parity: 'odd', coefficients: full.slice(0, degree + 1) };
  const points = defaultGridSize(degree);
  const scale = supTarget / maxOnChebyshevGrid(unscaled, (_x, value) => Math.abs(value), 0, points);
  const polynomial: ChebyshevSeries = { parity: 'odd', coefficients: unscaled.coefficients.map((c) => c * scale) };
  return {
    polynomial,
    delta,
    scale,
    maxError: maxOnChebyshevGrid(polynomial, (x, value) => Math.abs(value - scale / x), delta, points),
    supNorm: maxOnChebyshevGrid(polynomial, (_x, value) => Math.abs(value), 0, points),
    degree,
  };
}

/** max over δ ≤ |x| ≤ 1 of |q(x) − 1/x| on the default grid of q's degree. */
function measuredInverseError(coefficients: Float64Array, delta: number): number {
  const series: ChebyshevSeries = { parity: 'odd', coefficients };
  return maxOnChebyshevGrid(series, (x, value) => Math.abs(value - 1 / x), delta, defaultGridSize(coefficients.length - 1));
}
