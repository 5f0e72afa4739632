// oneBodyA: the matrix of the preconditioner A = T − T_B (the model's one-body part minus what the split moves into B).
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { FermionModel } from '../../model/FermionModel.js';

export function oneBodyA(model: FermionModel): ComplexMatrix {
  return {
    n: model.modes,
    re: Float64Array.from(model.oneBody.re, (x, e) => x - model.oneBodyInB.re[e]!),
    im: Float64Array.from(model.oneBody.im, (x, e) => x - model.oneBodyInB.im[e]!),
  };
}
