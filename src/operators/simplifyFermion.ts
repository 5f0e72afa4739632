// simplifyFermion: combines terms with identical factor lists (no reordering) and removes (near-)zero terms.
import type { LadderSum } from './LadderSum.js';
import { ladderCode } from './internal/ladderCode.js';
import { TermAccumulator } from './internal/TermAccumulator.js';

/**
 * @param options.tolerance drop terms with |c| ≤ tolerance; default 0 removes exact zeros only.
 * Use normalOrder to also identify products equal up to anticommutation.
 */
export function simplifyFermion(op: LadderSum, options: { tolerance?: number } = {}): LadderSum {
  const acc = new TermAccumulator();
  for (const t of op.terms) acc.add(t.ops.map(ladderCode), t.re, t.im);
  return acc.result(options.tolerance ?? 0);
}
