// Test helper: the resolvent (w − H)⁻¹ restricted to one electron-number sector, from the test suite's own dense
// Jordan–Wigner Hamiltonian (test/helpers/denseFock.ts) and mathjs's dense complex inverse — independent of src/.
import { complex, inv, matrix, type Complex, type Matrix } from 'mathjs';
import type { ComplexScalar } from '../../src/linalg/ComplexScalar.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { denseHamiltonian, sectorStates } from '../helpers/denseFock.js';

export interface SectorResolvent {
  /** Fock basis indices of the sector's states. */
  readonly states: number[];
  /** entries[r][c] = <states[r]| (w − H)⁻¹ |states[c]>. */
  readonly entries: Complex[][];
}

export function sectorResolvent(model: FermionModel, w: ComplexScalar, electrons: number): SectorResolvent {
  const H = denseHamiltonian(model, electrons);
  const shifted = H.map((row, r) => row.map((a, c) => complex((r === c ? w.re : 0) - a.re, (r === c ? w.im : 0) - a.im)));
  const entries = (inv(matrix(shifted)) as Matrix).toArray() as Complex[][];
  return { states: sectorStates(model.modes, electrons), entries };
}
