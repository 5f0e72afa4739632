// addFermion: the sum of fermion operators (terms concatenated; simplify or normal-order to combine them).
import type { FermionOperator } from './FermionOperator.js';

/** a + b + …; terms are concatenated, not combined (see simplifyFermion, normalOrder). */
export function addFermion(...operators: readonly FermionOperator[]): FermionOperator {
  return { terms: operators.flatMap((op) => op.terms) };
}
