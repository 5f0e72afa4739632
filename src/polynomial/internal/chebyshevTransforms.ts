/**
 * chebyshevTransforms: values ↔ Chebyshev coefficients on the N first-kind Chebyshev points
 * x_l = cos(π(2l+1)/(2N)), l = 0 … N−1 (N a power of two), through one zero-padded complex FFT of
 * length 2N each:
 *   values:       f_l = Σ_k c_k cos(kπ(2l+1)/(2N))       = Re Σ_k (c_k e^{iπk/(2N)}) e^{2πi kl/(2N)}    (DCT-III)
 *   coefficients: c_k = (2/N) Σ_l f_l cos(kπ(2l+1)/(2N)) = (2/N) Re[e^{−iπk/(2N)} Σ_l f_l e^{−2πi kl/(2N)}] (DCT-II),
 * with c_0 halved (Trefethen, Approximation Theory and Approximation Practice, SIAM 2013, ch. 3 and 8).
 */
import { ensureFits } from '../../core/memoryBudget.js';
import { fourierTransform } from './fourierTransform.js';

/** The N first-kind Chebyshev points, descending from near 1 to near −1. */
export function chebyshevPoints(count: number): Float64Array {
  const points = new Float64Array(count);
  for (let l = 0; l < count; l++) points[l] = Math.sin((Math.PI * (count - 2 * l - 1)) / (2 * count));
  return points;
}

/** Values of Σ_k c_k T_k at the `count` Chebyshev points (count a power of two ≥ coefficients.length). */
export function chebyshevValues(coefficients: Float64Array, count: number): Float64Array {
  if (coefficients.length > count) throw new RangeError(`chebyshevValues: ${coefficients.length} coefficients need at least as many points, got ${count}`);
  ensureFits(32 * count, `a Chebyshev grid of ${count} points`);
  const re = new Float64Array(2 * count);
  const im = new Float64Array(2 * count);
  for (let k = 0; k < coefficients.length; k++) {
    const angle = (Math.PI * k) / (2 * count);
    re[k] = coefficients[k]! * Math.cos(angle);
    im[k] = coefficients[k]! * Math.sin(angle);
  }
  fourierTransform(re, im, 1);
  return re.slice(0, count);
}

/** The first `length` Chebyshev coefficients of the degree-(N−1) interpolant through values at the N Chebyshev points. */
export function chebyshevCoefficients(values: Float64Array, length: number): Float64Array {
  const count = values.length;
  ensureFits(32 * count, `a Chebyshev transform of ${count} points`);
  const re = new Float64Array(2 * count);
  const im = new Float64Array(2 * count);
  re.set(values);
  fourierTransform(re, im, -1);
  const coefficients = new Float64Array(length);
  for (let k = 0; k < Math.min(length, count); k++) {
    const angle = (Math.PI * k) / (2 * count);
    coefficients[k] = ((k === 0 ? 1 : 2) / count) * (Math.cos(angle) * re[k]! + Math.sin(angle) * im[k]!);
  }
  return coefficients;
}

/** Smallest power of two ≥ n (n ≥ 1). */
export function powerOfTwoAtLeast(n: number): number {
  let size = 1;
  while (size < n) size *= 2;
  return size;
}
