// multiplyFermion: the operator product a·b (factor lists concatenated; normal-order to reduce it).
import type { LadderSum } from './LadderSum.js';

/** The product a·b: every term of a followed by every term of b; not reduced (see normalOrder). */
export function multiplyFermion(a: LadderSum, b: LadderSum): LadderSum {
  return {
    terms: a.terms.flatMap((s) =>
      b.terms.map((t) => ({ ops: [...s.ops, ...t.ops], re: s.re * t.re - s.im * t.im, im: s.re * t.im + s.im * t.re })),
    ),
  };
}
