// BuiltHamiltonian: what each model-file form contributes before the common keys are applied.
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { ModelForm, TwoBodyTerm } from '../FermionModel.js';

export interface BuiltHamiltonian {
  readonly form: ModelForm;
  readonly modes: number;
  readonly oneBody: ComplexMatrix;
  readonly twoBody: readonly TwoBodyTerm[];
  /** A form whose split is fixed (the continuum preset) gives the part of T that belongs to B; others take `split`. */
  readonly oneBodyInB?: ComplexMatrix;
  /** Presets only: spin-up modes (site order) then spin-down modes. */
  readonly spinBlocks?: { readonly up: readonly number[]; readonly down: readonly number[] };
}
