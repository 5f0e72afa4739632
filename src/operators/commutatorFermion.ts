// commutatorFermion: [a, b] = ab − ba, returned normal-ordered.
import type { FermionOperator } from './FermionOperator.js';
import { multiplyFermion } from './multiplyFermion.js';
import { normalOrder } from './normalOrder.js';
import { scaleFermion } from './scaleFermion.js';

/** [a, b] = ab − ba, normal-ordered with exact zeros removed. */
export function commutatorFermion(a: FermionOperator, b: FermionOperator): FermionOperator {
  return normalOrder({ terms: [...multiplyFermion(a, b).terms, ...scaleFermion(multiplyFermion(b, a), -1).terms] });
}
