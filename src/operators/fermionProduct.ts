// fermionProduct: a one-term LadderSum c · o_1 o_2 … from a list of ladder factors.
import type { LadderSum, LadderOp } from './LadderSum.js';

/**
 * @param ops factors, leftmost first; [] gives the identity times c.
 * @param re,im the coefficient c (default 1).
 */
export function fermionProduct(ops: readonly LadderOp[], re = 1, im = 0): LadderSum {
  for (const op of ops) {
    if (!Number.isInteger(op.mode) || op.mode < 0) throw new RangeError(`fermionProduct: bad mode ${op.mode}`);
  }
  return { terms: [{ ops: ops.map(({ mode, dagger }) => ({ mode, dagger })), re, im }] };
}
