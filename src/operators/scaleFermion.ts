// scaleFermion: a fermion operator times the complex number re + i·im.
import type { LadderSum } from './LadderSum.js';

/** (re + i·im) · op. */
export function scaleFermion(op: LadderSum, re: number, im = 0): LadderSum {
  return { terms: op.terms.map((t) => ({ ops: t.ops, re: t.re * re - t.im * im, im: t.re * im + t.im * re })) };
}
