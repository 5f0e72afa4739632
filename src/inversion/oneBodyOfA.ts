/**
 * oneBodyOfA: the one-body matrix of the preconditioned route's A, T_A = T − T_B (the model's one-body part minus what
 * the split moves into B, ../shared/CONVENTIONS.md), which the fast inverse and the orbital rotation diagonalise.
 */
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel } from '../model/FermionModel.js';

export function oneBodyOfA(model: FermionModel): ComplexMatrix {
  const n = model.modes;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let e = 0; e < n * n; e++) {
    re[e] = model.oneBody.re[e]! - model.oneBodyInB.re[e]!;
    im[e] = model.oneBody.im[e]! - model.oneBodyInB.im[e]!;
  }
  return { n, re, im };
}
