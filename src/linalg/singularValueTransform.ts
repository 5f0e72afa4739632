/**
 * singularValueTransform: the singular value transform U diag(f(σ)) V† of M = U diag(σ) V†, which for an
 * odd polynomial f is the operator QSVT produces from a block-encoding of M (Gilyén, Su, Low & Wiebe,
 * STOC 2019, Def. 16 and Thm. 17); a dense reference for checking QSVT circuits.
 */
import type { ComplexMatrix } from './ComplexMatrix.js';
import { singularValueDecomposition } from './singularValues.js';

export function matrixFunctionOfSingularValues(M: ComplexMatrix, f: (sigma: number) => number): ComplexMatrix {
  const { U, sigma, V } = singularValueDecomposition(M);
  const n = M.n;
  const values = sigma.map((s) => f(s));
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  // (U diag(f) V†)_ij = Σ_k U_ik f_k conj(V_jk)
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const ur = U.re[i * n + k]! * values[k]!;
      const ui = U.im[i * n + k]! * values[k]!;
      if (ur === 0 && ui === 0) continue;
      for (let j = 0; j < n; j++) {
        const vr = V.re[j * n + k]!;
        const vi = V.im[j * n + k]!;
        re[i * n + j] = re[i * n + j]! + ur * vr + ui * vi;
        im[i * n + j] = im[i * n + j]! + ui * vr - ur * vi;
      }
    }
  }
  return { n, re, im };
}
