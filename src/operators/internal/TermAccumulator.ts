// TermAccumulator: sums coefficients of identical factor lists (keyed by their codes), then drops small ones.
import type { LadderSum } from '../LadderSum.js';
import { ladderFromCode } from './ladderCode.js';

export class TermAccumulator {
  private readonly sums = new Map<string, { codes: readonly number[]; re: number; im: number }>();

  add(codes: readonly number[], re: number, im: number): void {
    const key = codes.join(',');
    const sum = this.sums.get(key);
    if (sum === undefined) this.sums.set(key, { codes, re, im });
    else {
      sum.re += re;
      sum.im += im;
    }
  }

  /** Terms with |c| > tolerance (tolerance 0 removes exact zeros only), in first-seen order. */
  result(tolerance: number): LadderSum {
    const terms = [];
    for (const { codes, re, im } of this.sums.values()) {
      if (Math.hypot(re, im) > tolerance || (tolerance === 0 && (re !== 0 || im !== 0))) {
        // + 0 turns −0 into 0 so equal operators compare equal.
        terms.push({ ops: codes.map(ladderFromCode), re: re + 0, im: im + 0 });
      }
    }
    return { terms };
  }
}
