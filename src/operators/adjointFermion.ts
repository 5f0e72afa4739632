// adjointFermion: the Hermitian adjoint, (c · o_1 … o_k)† = c̄ · o_k† … o_1†.
import type { LadderSum } from './LadderSum.js';

/** op†: factors reversed with daggers flipped, coefficients conjugated; not reordered. */
export function adjointFermion(op: LadderSum): LadderSum {
  return {
    terms: op.terms.map((t) => ({
      ops: [...t.ops].reverse().map(({ mode, dagger }) => ({ mode, dagger: !dagger })),
      re: t.re,
      im: -t.im,
    })),
  };
}
