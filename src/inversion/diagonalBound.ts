/**
 * diagonalBound: for a model whose B part is diagonal in the occupation basis (number operators n_p and density–density
 * products n_p n_q), the centring shift b₀ and the radius β with |B(x) − b₀| ≤ β on every occupation of an electron-number
 * window — the α of diagonalEncoding — or the reason B is not diagonal.
 */
import type { FermionModel } from '../model/FermionModel.js';
import { modelHamiltonian } from '../operators/modelHamiltonian.js';
import { diagonalRange } from './internal/diagonalRange.js';
import { diagonalTerms, type DiagonalTerms } from './internal/diagonalTerms.js';
import type { Window } from './internal/energyGrid.js';

export interface DiagonalBound {
  readonly terms: DiagonalTerms;
  /** The window bounded over ([0, modes] for the whole Fock space). */
  readonly window: Window;
  /** low ≤ B(x) ≤ high on the window (rigorous, not necessarily attained). */
  readonly low: number;
  readonly high: number;
  /** b₀ = (low + high)/2. */
  readonly shift: number;
  /** β = (high − low)/2 ≥ max |B(x) − b₀| on the window. */
  readonly beta: number;
}

const termsPerModel = new WeakMap<FermionModel, DiagonalTerms | { readonly notDiagonal: string }>();

/** B's terms read as a function of the occupations (once per model), or why they are not one. */
export function diagonalTermsOfB(model: FermionModel): DiagonalTerms | { readonly notDiagonal: string } {
  let terms = termsPerModel.get(model);
  if (!terms) termsPerModel.set(model, (terms = diagonalTerms(modelHamiltonian(model, { part: 'B' }), model.modes)));
  return terms;
}

/** Bounds already computed, per model and window: the preconditioned plan and diagonalEncoding both ask for them. */
const boundsPerModel = new WeakMap<FermionModel, Map<string, DiagonalBound>>();

/**
 * @param electrons N or [Nmin, Nmax]; omitted: the whole Fock space.
 * @returns the same (read-only) object for the same model and window.
 * @throws RangeError for a window outside 0…modes.
 */
export function diagonalBound(model: FermionModel, electrons?: number | readonly [number, number]): DiagonalBound | { readonly notDiagonal: string } {
  const terms = diagonalTermsOfB(model);
  if ('notDiagonal' in terms) return terms;
  const [min, max] = electrons === undefined ? [0, model.modes] : typeof electrons === 'number' ? [electrons, electrons] : electrons;
  let known = boundsPerModel.get(model);
  if (!known) boundsPerModel.set(model, (known = new Map()));
  const key = `${min}:${max}`;
  const cached = known.get(key);
  if (cached) return cached;
  const window = { min, max };
  const range = diagonalRange(terms.single, terms.pairs, window);
  const low = terms.constant + range.low;
  const high = terms.constant + range.high;
  const bound = { terms, window, low, high, shift: (low + high) / 2, beta: (high - low) / 2 };
  known.set(key, bound);
  return bound;
}
