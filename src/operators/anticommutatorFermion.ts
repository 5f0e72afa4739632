// anticommutatorFermion: {a, b} = ab + ba, returned normal-ordered.
import type { FermionOperator } from './FermionOperator.js';
import { multiplyFermion } from './multiplyFermion.js';
import { normalOrder } from './normalOrder.js';

/** {a, b} = ab + ba, normal-ordered with exact zeros removed. */
export function anticommutatorFermion(a: FermionOperator, b: FermionOperator): FermionOperator {
  return normalOrder({ terms: [...multiplyFermion(a, b).terms, ...multiplyFermion(b, a).terms] });
}
