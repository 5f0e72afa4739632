// exactInverse: the dense P (w − A)⁻¹ P on the Fock space for A = Σ T_ij a_i† a_j and P the projector onto the
// electron-number window — from A's matrix (ladderSumMatrix), inverted sector by sector through its eigenpairs.
import { zeroMatrix } from '../../linalg/zeroMatrix.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { hermitianEigen } from '../../linalg/hermitianEigen.js';
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import { ladderSumMatrix } from '../../operators/ladderSumMatrix.js';
import type { LadderTerm } from '../../operators/LadderSum.js';
import type { Window } from './energyGrid.js';

const popcount = (x: number): number => {
  let count = 0;
  for (let v = x; v !== 0; v &= v - 1) count++;
  return count;
};

export function exactInverse(T: ComplexMatrix, w: ComplexScalar, window: Window): ComplexMatrix {
  const n = T.n;
  const terms: LadderTerm[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const re = T.re[i * n + j]!;
      const im = T.im[i * n + j]!;
      if (re !== 0 || im !== 0) terms.push({ ops: [{ mode: i, dagger: true }, { mode: j, dagger: false }], re, im });
    }
  }
  const A = ladderSumMatrix({ terms }, n);
  const dim = 2 ** n;
  const out = zeroMatrix(dim);
  for (let N = window.min; N <= window.max; N++) {
    const basis = Array.from({ length: dim }, (_, s) => s).filter((s) => popcount(s) === N);
    const d = basis.length;
    const sector = zeroMatrix(d);
    basis.forEach((r, a) =>
      basis.forEach((s, b) => {
        sector.re[a * d + b] = A.re[r * dim + s]!;
        sector.im[a * d + b] = A.im[r * dim + s]!;
      }),
    );
    const { values, vectors: W } = hermitianEigen(sector);
    // (w − A_N)⁻¹ = Σ_q W_q W_q† / (w − λ_q).
    for (let q = 0; q < d; q++) {
      const dr = w.re - values[q]!;
      const di = w.im;
      const den = dr * dr + di * di;
      const gr = dr / den;
      const gi = -di / den;
      for (let a = 0; a < d; a++) {
        const xr = W.re[a * d + q]!;
        const xi = W.im[a * d + q]!;
        for (let b = 0; b < d; b++) {
          const yr = W.re[b * d + q]!;
          const yi = -W.im[b * d + q]!;
          const pr = xr * yr - xi * yi;
          const pi = xr * yi + xi * yr;
          const e = basis[a]! * dim + basis[b]!;
          out.re[e] = out.re[e]! + pr * gr - pi * gi;
          out.im[e] = out.im[e]! + pr * gi + pi * gr;
        }
      }
    }
  }
  return out;
}
