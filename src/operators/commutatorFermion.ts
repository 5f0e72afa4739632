// commutatorFermion: [a, b] = ab − ba, returned normal-ordered.
import type { LadderSum } from './LadderSum.js';
import { multiplyFermion } from './multiplyFermion.js';
import { normalOrder } from './normalOrder.js';
import { scaleFermion } from './scaleFermion.js';

/** [a, b] = ab − ba, normal-ordered with exact zeros removed. */
export function commutatorFermion(a: LadderSum, b: LadderSum): LadderSum {
  return normalOrder({ terms: [...multiplyFermion(a, b).terms, ...scaleFermion(multiplyFermion(b, a), -1).terms] });
}
