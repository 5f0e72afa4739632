/**
 * sectorConditionNumber: ‖M⁻¹‖ = ‖(w − H)⁻¹ (w − b₀ − A)‖ on one electron-number sector, for M = I − (w − b₀ − A)⁻¹ B'
 * (the operator the preconditioned route inverts; w − H = (w − b₀ − A) M), from dense sector blocks of H and A built from
 * the model's fermion terms: the sector block of w − H inverted by Gauss–Jordan elimination (sectorResolvent), multiplied
 * by that of w − b₀ − A, and the largest singular value taken (one-sided Jacobi SVD).
 */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { matrixMultiply } from '../../linalg/matrixMultiply.js';
import { singularValueDecomposition } from '../../linalg/singularValues.js';
import { sectorResolvent } from './sectorResolvent.js';

/** The block of `sign`·M on the given basis states, plus `diagonal` on its diagonal. */
function sectorBlock(M: ComplexMatrix, states: readonly number[], sign: 1 | -1, diagonal: ComplexScalar): ComplexMatrix {
  const d = states.length;
  const re = new Float64Array(d * d);
  const im = new Float64Array(d * d);
  for (let a = 0; a < d; a++) {
    for (let b = 0; b < d; b++) {
      re[a * d + b] = sign * M.re[states[a]! * M.n + states[b]!]!;
      im[a * d + b] = sign * M.im[states[a]! * M.n + states[b]!]!;
    }
    re[a * d + a] = re[a * d + a]! + diagonal.re;
    im[a * d + a] = im[a * d + a]! + diagonal.im;
  }
  return { n: d, re, im };
}

/** @param states the sector's basis states (popcount N); H and A dense Fock-space matrices that conserve N. */
export function sectorConditionNumber(H: ComplexMatrix, A: ComplexMatrix, w: ComplexScalar, shift: number, N: number, states: readonly number[]): number {
  const resolvent = sectorBlock(sectorResolvent(H, w, { min: N, max: N }), states, 1, { re: 0, im: 0 });
  const shiftedA = sectorBlock(A, states, -1, { re: w.re - shift, im: w.im });
  return singularValueDecomposition(matrixMultiply(resolvent, shiftedA)).sigma[0] ?? 0;
}
