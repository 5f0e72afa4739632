/**
 * FermionModel: the one internal form every model file (explicit, lattice preset, impurity preset, continuum preset)
 * is turned into. H = Σ_ij T_ij a_i† a_j + ½ Σ_ijkl V_ijkl a_i† a_j† a_l a_k (physicists' order),
 * modes numbered as in ../shared/CONVENTIONS.md (presets: all spin-up modes, then all spin-down).
 */

import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';

/** One two-body coefficient V_ijkl = <ij|v|kl>; repeated (i,j,k,l) entries are already summed. */
export interface TwoBodyTerm {
  readonly i: number;
  readonly j: number;
  readonly k: number;
  readonly l: number;
  readonly re: number;
  readonly im: number;
}

export interface FrequencyGrid {
  readonly from: number;
  readonly to: number;
  readonly points: number;
}

/** Which model-file form a model came from, with the few facts a summary needs. */
export type ModelForm =
  | { readonly kind: 'explicit' }
  | {
      readonly kind: 'hubbard';
      readonly shape: 'chain' | 'ring' | 'grid';
      /** [L] for chain and ring, [Lx, Ly] for grid. */
      readonly size: readonly number[];
    }
  | { readonly kind: 'impurity'; readonly bathLevels: number }
  | {
      readonly kind: 'continuum';
      readonly dimension: 1 | 2 | 3;
      /** Grid points n_d per dimension. */
      readonly points: readonly number[];
      /** Box lengths L_d per dimension (bohr). */
      readonly box: readonly number[];
    };

export interface FermionModel {
  readonly name: string;
  /** The model-file form this model was read from (absent for models built in code). */
  readonly form?: ModelForm;
  readonly modes: number;
  readonly electrons: number;
  /** Presets only: the mode indices of each spin block (up block first, then down). */
  readonly spinBlocks?: { readonly up: readonly number[]; readonly down: readonly number[] };
  /**
   * Presets only, and only when the model file gives `spin` (or code sets it): N↑ − N↓ of the one
   * S_z sector the ground level is restricted to. Absent: the ground level is that of the whole
   * N-electron sector, every S_z sector counting (CONVENTIONS.md) — there is no default S_z.
   */
  readonly spinPolarization?: number;
  /** T, chemical potential included. Hermitian. */
  readonly oneBody: ComplexMatrix;
  /** The part of T that the split moves into B (zero matrix when nothing is moved); A = T − this. */
  readonly oneBodyInB: ComplexMatrix;
  /** V terms; the two-body part always belongs to B. */
  readonly twoBody: readonly TwoBodyTerm[];
  /** η > 0. */
  readonly broadening: number;
  readonly grid: FrequencyGrid;
}
