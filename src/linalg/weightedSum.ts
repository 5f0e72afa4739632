// weightedSum: Σ_k w_k M_k for complex weights w_k and equally sized dense matrices M_k.
import type { ComplexMatrix } from './ComplexMatrix.js';
import type { ComplexScalar } from './ComplexScalar.js';
import { zeroMatrix } from './zeroMatrix.js';

/** Σ_k w_k M_k. */
export function weightedSum(terms: readonly { weight: ComplexScalar; matrix: ComplexMatrix }[], n: number): ComplexMatrix {
  const out = zeroMatrix(n);
  for (const { weight, matrix } of terms) {
    for (let e = 0; e < n * n; e++) {
      const r = matrix.re[e] as number;
      const i = matrix.im[e] as number;
      out.re[e] = (out.re[e] as number) + weight.re * r - weight.im * i;
      out.im[e] = (out.im[e] as number) + weight.re * i + weight.im * r;
    }
  }
  return out;
}
