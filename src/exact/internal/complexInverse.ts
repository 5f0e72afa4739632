/** complexInverse: inverse of a dense complex matrix by Gauss–Jordan elimination with partial pivoting. */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';

/** The matrix has no usable pivot in `column` (all candidates zero or not finite). */
export class SingularMatrixError extends RangeError {
  override readonly name: string = 'SingularMatrixError';
  constructor(readonly column: number) {
    super(`complexInverse: matrix is singular (no pivot in column ${column})`);
  }
}

/** @throws SingularMatrixError when elimination finds no non-zero finite pivot */

export function complexInverse(a: ComplexMatrix): ComplexMatrix {
  const n = a.n;
  const w = 2 * n;
  const re = new Float64Array(n * w);
  const im = new Float64Array(n * w);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      re[i * w + j] = a.re[i * n + j]!;
      im[i * w + j] = a.im[i * n + j]!;
    }
    re[i * w + n + i] = 1;
  }
  for (let c = 0; c < n; c++) {
    let pivot = c;
    let best = -1;
    for (let r = c; r < n; r++) {
      const size = Math.hypot(re[r * w + c]!, im[r * w + c]!);
      if (size > best) {
        best = size;
        pivot = r;
      }
    }
    if (!(best > 0) || !Number.isFinite(best)) throw new SingularMatrixError(c);
    if (pivot !== c) {
      for (let k = 0; k < w; k++) {
        const tr = re[c * w + k]!;
        const ti = im[c * w + k]!;
        re[c * w + k] = re[pivot * w + k]!;
        im[c * w + k] = im[pivot * w + k]!;
        re[pivot * w + k] = tr;
        im[pivot * w + k] = ti;
      }
    }
    const pr = re[c * w + c]!;
    const pi = im[c * w + c]!;
    const den = pr * pr + pi * pi;
    const ir = pr / den;
    const ii = -pi / den;
    for (let k = 0; k < w; k++) {
      const xr = re[c * w + k]!;
      const xi = im[c * w + k]!;
      re[c * w + k] = xr * ir - xi * ii;
      im[c * w + k] = xr * ii + xi * ir;
    }
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const fr = re[r * w + c]!;
      const fi = im[r * w + c]!;
      if (fr === 0 && fi === 0) continue;
      for (let k = 0; k < w; k++) {
        const xr = re[c * w + k]!;
        const xi = im[c * w + k]!;
        re[r * w + k]! -= fr * xr - fi * xi;
        im[r * w + k]! -= fr * xi + fi * xr;
      }
    }
  }
  const outRe = new Float64Array(n * n);
  const outIm = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      outRe[i * n + j] = re[i * w + n + j]!;
      outIm[i * n + j] = im[i * w + n + j]!;
    }
  }
  return { n, re: outRe, im: outIm };
}
