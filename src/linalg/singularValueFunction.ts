/**
 * singularValueFunction: the singular-value transform f^{(SV)}(A) of a dense square matrix A = W Σ V†, in the meaning of
 * Gilyén, Su, Low & Wiebe (STOC 2019, Def. 16): W f(Σ) V† for odd f (matrixFunctionOfSingularValues), V f(Σ) V† for even
 * f, computed from the Hermitian eigen-decomposition A†A = V Σ² V†, which fixes V on the kernel of A as well.
 */
import type { ComplexMatrix } from './ComplexMatrix.js';
import { adjointMatrix } from './adjointMatrix.js';
import { hermitianEigen } from './hermitianEigen.js';
import { matrixMultiply } from './matrixMultiply.js';
import { matrixFunctionOfSingularValues } from './singularValueTransform.js';

export function singularValueFunction(a: ComplexMatrix, f: (sigma: number) => number, parity: 'even' | 'odd'): ComplexMatrix {
  if (parity === 'odd') return matrixFunctionOfSingularValues(a, f);
  const n = a.n;
  const { values, vectors } = hermitianEigen(matrixMultiply(adjointMatrix(a), a));
  const weights = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    weights[k] = f(Math.sqrt(Math.max(0, values[k]!)));
  }
  // V diag(weights) V†
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let sr = 0;
      let si = 0;
      for (let k = 0; k < n; k++) {
        const w = weights[k]!;
        if (w === 0) continue;
        const ar = vectors.re[i * n + k]!;
        const ai = vectors.im[i * n + k]!;
        const br = vectors.re[j * n + k]!;
        const bi = -vectors.im[j * n + k]!;
        sr += w * (ar * br - ai * bi);
        si += w * (ar * bi + ai * br);
      }
      re[i * n + j] = sr;
      im[i * n + j] = si;
    }
  }
  return { n, re, im };
}
