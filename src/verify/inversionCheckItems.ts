/**
 * inversionCheckItems: the four inversion rows of `polewright check` (inversionCheckEncodings) paired with references built
 * from the model's fermion terms — P_N (w − A)⁻¹ P_N by sector-wise Gauss–Jordan inversion of A's Fock matrix for the fast
 * inverses, w − H by applying H's ladder terms for the direct shifts — and, for the fast inverses, the system columns to
 * check above 12 qubits: every basis state of the row's electron number plus one of every other number (where that is
 * cheap enough; else random probes).
 */
import { ancillaQubits } from '../blocks/BlockEncoding.js';
import { inversionCheckEncodings, type InversionCheckOptions, type InversionCheckRow } from '../inversion/inversionCheckEncodings.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import type { CheckItem } from './CheckItem.js';
import { fockReference } from './fockReference.js';
import { fockOperatorMatrix, MAX_DENSE_FOCK_MODES, modelFockTerms, type FockTerm } from './internal/fockOperatorMatrix.js';
import { sectorResolvent } from './internal/sectorResolvent.js';
import { denseReference } from './verifyEncoding.js';
import { popcount32 } from '../operators/internal/popcount.js';

/** Up to this width verifyEncoding checks every column anyway. */
const EXHAUSTIVE_LIMIT = 12;
/** Largest simulated amplitude count (columns × 2^width) for which the fast-inverse rows are checked column by column. */
export const COLUMN_CHECK_BUDGET = 2 ** 22;


/** Every basis state with exactly N electrons (ones), in increasing order. */
export function sectorStates(modes: number, N: number): number[] {
  const states: number[] = [];
  for (let s = 0; s < 2 ** modes; s++) if (popcount32(s) === N) states.push(s);
  return states;
}

/** Every basis state with N electrons, then the first basis state of each other electron number. */
export function sectorColumns(modes: number, N: number): number[] {
  const others = new Map<number, number>();
  for (let s = 0; s < 2 ** modes; s++) {
    const count = popcount32(s);
    if (count !== N && !others.has(count)) others.set(count, s);
  }
  return [...sectorStates(modes, N), ...others.values()];
}

function shiftTerms(model: FermionModel, w: ComplexScalar): FockTerm[] {
  return [{ factors: [], re: w.re, im: w.im }, ...modelFockTerms(model, 'all').map((t) => ({ ...t, re: -t.re, im: -t.im }))];
}

function itemFor(model: FermionModel, row: InversionCheckRow): CheckItem {
  const n = model.modes;
  if (row.electrons === null) return { encoding: row.encoding, reference: () => fockReference(shiftTerms(model, row.w), n) };
  if (n > MAX_DENSE_FOCK_MODES) return { encoding: row.encoding };
  const N = row.electrons;
  const reference = () => denseReference(sectorResolvent(fockOperatorMatrix(modelFockTerms(model, 'A'), n), row.w, { min: N, max: N }));
  const columns = sectorColumns(n, N);
  const width = n + ancillaQubits(row.encoding);
  const byColumns = width > EXHAUSTIVE_LIMIT && columns.length * 2 ** width <= COLUMN_CHECK_BUDGET;
  return byColumns ? { encoding: row.encoding, reference, columns } : { encoding: row.encoding, reference };
}

export function inversionCheckItems(model: FermionModel, options: InversionCheckOptions): CheckItem[] {
  return inversionCheckEncodings(model, options).map((row) => itemFor(model, row));
}
