// normalOrder: rewrites a fermion operator with all creators left of all annihilators, using the CAR
// {a_i, a_j†} = δ_ij, {a_i, a_j} = 0; like terms combined and zero terms removed.
import type { LadderSum } from './LadderSum.js';
import { ladderCode } from './internal/ladderCode.js';
import { TermAccumulator } from './internal/TermAccumulator.js';

/**
 * Canonical order: creators by ascending mode, then annihilators by descending mode, e.g. a†0 a†2 a3 a1,
 * so the adjoint of a canonical product is canonical again. Repeated factors (a_i a_i, a†_i a†_i) vanish.
 * @param options.tolerance drop terms with |c| ≤ tolerance; default 0 removes exact zeros only.
 */
export function normalOrder(op: LadderSum, options: { tolerance?: number } = {}): LadderSum {
  const acc = new TermAccumulator();
  for (const t of op.terms) reduce(t.ops.map(ladderCode), t.re, t.im, acc);
  return acc.result(options.tolerance ?? 0);
}

/** Bubble-sorts the codes, one adjacent swap at a time; a_p a†_p branches into 1 − a†_p a_p. */
function reduce(codes: number[], re: number, im: number, acc: TermAccumulator): void {
  let sign = 1;
  for (let i = 0; i + 1 < codes.length; ) {
    const a = codes[i]!;
    const b = codes[i + 1]!;
    const aCreates = (a & 1) === 1;
    const bCreates = (b & 1) === 1;
    let swap: boolean;
    if (aCreates !== bCreates) swap = bCreates;
    else if (a === b) return;
    else swap = aCreates ? a > b : a < b;
    if (!swap) {
      i++;
      continue;
    }
    if (!aCreates && bCreates && a >> 1 === b >> 1) {
      reduce([...codes.slice(0, i), ...codes.slice(i + 2)], sign * re, sign * im, acc);
    }
    codes[i] = b;
    codes[i + 1] = a;
    sign = -sign;
    i = Math.max(0, i - 1);
  }
  acc.add(codes, sign * re, sign * im);
}
