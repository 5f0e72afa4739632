/**
 * modelEncodings: the Pauli-LCU block-encodings of a model's H, its one-body part A and its part B
 * (two-body terms plus any one-body terms the split moves), via Jordan–Wigner.
 */
import type { FermionModel } from '../../model/FermionModel.js';
import { jordanWigner } from '../../operators/jordanWigner.js';
import { modelHamiltonian } from '../../operators/modelHamiltonian.js';
import type { BlockEncoding } from '../BlockEncoding.js';
import { pauliLcu } from './pauliLcu.js';

export interface ModelEncodings {
  readonly H: BlockEncoding;
  readonly A: BlockEncoding;
  readonly B: BlockEncoding;
}

export function modelEncodings(model: FermionModel): ModelEncodings {
  const encode = (part: 'all' | 'A' | 'B', label: string) =>
    pauliLcu(jordanWigner(modelHamiltonian(model, { part }), model.modes), label);
  return { H: encode('all', 'H'), A: encode('A', 'A (one-body)'), B: encode('B', 'B (two-body)') };
}
