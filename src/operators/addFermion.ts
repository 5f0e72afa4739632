// addFermion: the sum of fermion operators (terms concatenated; simplify or normal-order to combine them).
import type { LadderSum } from './LadderSum.js';

/** a + b + …; terms are concatenated, not combined (see simplifyFermion, normalOrder). */
export function addFermion(...operators: readonly LadderSum[]): LadderSum {
  return { terms: operators.flatMap((op) => op.terms) };
}
