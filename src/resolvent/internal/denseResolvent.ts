/**
 * denseResolvent: the exact (w − H)⁻¹ on the Fock space, independent of any circuit: H as a dense matrix from the model's
 * ladder operators (modelHamiltonian, ladderSumMatrix), diagonalised (H = Q diag(λ) Q†), then Q diag(1/(w − λ)) Q†;
 * with an electron-number window [min, max], P (w − H)⁻¹ P for P the projector on the occupation patterns in it.
 */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { hermitianEigen } from '../../linalg/hermitianEigen.js';
import type { FermionModel } from '../../model/FermionModel.js';
import { ladderSumMatrix } from '../../operators/ladderSumMatrix.js';
import { modelHamiltonian } from '../../operators/modelHamiltonian.js';
import { ensureFits } from '../../core/memoryBudget.js';
import { popcount32 } from '../../operators/internal/popcount.js';


export function denseResolvent(model: FermionModel, w: ComplexScalar, window: { readonly min: number; readonly max: number } | null): ComplexMatrix {
  const dim = 2 ** model.modes;
  ensureFits(6 * 8 * dim * dim, `a dense ${dim}×${dim} resolvent`);
  const { values, vectors } = hermitianEigen(ladderSumMatrix(modelHamiltonian(model), model.modes));
  // 1/(w − λ) = (conj(w) − λ)/|w − λ|², split into real and imaginary weights.
  const weightRe = new Float64Array(dim);
  const weightIm = new Float64Array(dim);
  for (let k = 0; k < dim; k++) {
    const dr = w.re - values[k]!;
    const norm = dr * dr + w.im * w.im;
    weightRe[k] = dr / norm;
    weightIm[k] = -w.im / norm;
  }
  const inside = Uint8Array.from({ length: dim }, (_, s) => (window === null || (popcount32(s) >= window.min && popcount32(s) <= window.max) ? 1 : 0));
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (let i = 0; i < dim; i++) {
    if (inside[i] === 0) continue;
    for (let j = 0; j < dim; j++) {
      if (inside[j] === 0) continue;
      let sr = 0;
      let si = 0;
      for (let k = 0; k < dim; k++) {
        // Q_ik · weight_k · conj(Q_jk)
        const ar = vectors.re[i * dim + k]!;
        const ai = vectors.im[i * dim + k]!;
        const br = vectors.re[j * dim + k]!;
        const bi = -vectors.im[j * dim + k]!;
        const pr = ar * br - ai * bi;
        const pi = ar * bi + ai * br;
        sr += pr * weightRe[k]! - pi * weightIm[k]!;
        si += pr * weightIm[k]! + pi * weightRe[k]!;
      }
      re[i * dim + j] = sr;
      im[i * dim + j] = si;
    }
  }
  return { n: dim, re, im };
}
