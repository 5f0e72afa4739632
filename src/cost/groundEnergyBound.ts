/**
 * groundEnergyBound: a rigorous lower bound on the lowest eigenvalue of H without solving it: writing the Jordan–Wigner
 * form as H = c_I·I + Σ_P c_P P, every Pauli string has norm 1, so λ_min(H) ≥ c_I − Σ_{P≠I} |c_P|.
 */
import type { FermionModel } from '../model/FermionModel.js';
import { jordanWigner } from '../operators/jordanWigner.js';
import { modelHamiltonian } from '../operators/modelHamiltonian.js';
import { simplifyPauli } from '../operators/simplifyPauli.js';

export function groundEnergyBound(model: FermionModel): number {
  const sum = simplifyPauli(jordanWigner(modelHamiltonian(model), model.modes));
  let bound = 0;
  for (const term of sum.terms) bound += term.x === 0n && term.z === 0n ? term.re : -Math.hypot(term.re, term.im);
  return bound;
}
