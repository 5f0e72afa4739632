// matrixColumn: column j of a dense complex matrix as separate real and imaginary arrays.
import type { ComplexMatrix } from './ComplexMatrix.js';

export function matrixColumn(M: ComplexMatrix, j: number): { re: Float64Array; im: Float64Array } {
  const n = M.n;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    re[i] = M.re[i * n + j]!;
    im[i] = M.im[i * n + j]!;
  }
  return { re, im };
}
