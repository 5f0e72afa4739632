// anticommutatorFermion: {a, b} = ab + ba, returned normal-ordered.
import type { LadderSum } from './LadderSum.js';
import { multiplyFermion } from './multiplyFermion.js';
import { normalOrder } from './normalOrder.js';

/** {a, b} = ab + ba, normal-ordered with exact zeros removed. */
export function anticommutatorFermion(a: LadderSum, b: LadderSum): LadderSum {
  return normalOrder({ terms: [...multiplyFermion(a, b).terms, ...multiplyFermion(b, a).terms] });
}
