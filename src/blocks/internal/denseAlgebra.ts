/**
 * Dense complex square-matrix algebra for the exact operators that block-encodings carry:
 * identity, product, sum with complex weights, adjoint, Kronecker product (little-endian layout).
 */
import type { ComplexMatrix } from '../../model/FermionModel.js';

export interface ComplexScalar {
  readonly re: number;
  readonly im: number;
}

export function zeroMatrix(n: number): ComplexMatrix {
  return { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
}

export function identityMatrix(n: number): ComplexMatrix {
  const m = zeroMatrix(n);
  for (let k = 0; k < n; k++) m.re[k * n + k] = 1;
  return m;
}

export function multiplyMatrices(a: ComplexMatrix, b: ComplexMatrix): ComplexMatrix {
  const n = a.n;
  const out = zeroMatrix(n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const ar = a.re[i * n + k] as number;
      const ai = a.im[i * n + k] as number;
      if (ar === 0 && ai === 0) continue;
      for (let j = 0; j < n; j++) {
        const br = b.re[k * n + j] as number;
        const bi = b.im[k * n + j] as number;
        out.re[i * n + j] = (out.re[i * n + j] as number) + ar * br - ai * bi;
        out.im[i * n + j] = (out.im[i * n + j] as number) + ar * bi + ai * br;
      }
    }
  }
  return out;
}

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

export function adjointMatrix(a: ComplexMatrix): ComplexMatrix {
  const n = a.n;
  const out = zeroMatrix(n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      out.re[j * n + i] = a.re[i * n + j] as number;
      out.im[j * n + i] = -(a.im[i * n + j] as number);
    }
  }
  return out;
}

/** high ⊗ low: `low` acts on the low-order bits of the index. */
export function kronMatrices(high: ComplexMatrix, low: ComplexMatrix): ComplexMatrix {
  const n = high.n * low.n;
  const out = zeroMatrix(n);
  for (let hi = 0; hi < high.n; hi++) {
    for (let hj = 0; hj < high.n; hj++) {
      const hr = high.re[hi * high.n + hj] as number;
      const him = high.im[hi * high.n + hj] as number;
      if (hr === 0 && him === 0) continue;
      for (let li = 0; li < low.n; li++) {
        for (let lj = 0; lj < low.n; lj++) {
          const lr = low.re[li * low.n + lj] as number;
          const lim = low.im[li * low.n + lj] as number;
          const e = (hi * low.n + li) * n + hj * low.n + lj;
          out.re[e] = hr * lr - him * lim;
          out.im[e] = hr * lim + him * lr;
        }
      }
    }
  }
  return out;
}
