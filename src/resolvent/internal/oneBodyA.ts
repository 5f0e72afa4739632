// oneBodyA: the matrix of the preconditioner A = T − T_B (the model's one-body part minus what the split moves into B),
// one object per model, so what the fast inverse derives from it alone (its orbital rotation) is built once per model.
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { FermionModel } from '../../model/FermionModel.js';

const perModel = new WeakMap<FermionModel, ComplexMatrix>();

export function oneBodyA(model: FermionModel): ComplexMatrix {
  const known = perModel.get(model);
  if (known) return known;
  const A = {
    n: model.modes,
    re: Float64Array.from(model.oneBody.re, (x, e) => x - model.oneBodyInB.re[e]!),
    im: Float64Array.from(model.oneBody.im, (x, e) => x - model.oneBodyInB.im[e]!),
  };
  perModel.set(model, A);
  return A;
}
