/**
 * formatCheckTable: the text report of `polewright check` — a heading with the thresholds, one row per block (sizes, α,
 * gates, error found, bound, method, verdict), the reasons of rows that did not pass, cost notes and a legend.
 */
import type { CheckRow, Verdict } from '../../verify/encodingCheck.js';
import { formatTable } from './formatTable.js';
import { totalOf } from './totalOf.js';

const RESULT: Record<Verdict, string> = { pass: 'pass', fail: 'FAIL', inconclusive: 'INCONCLUSIVE', skipped: 'skipped' };

export function formatCheckTable(
  heading: string,
  header: { readonly z: { re: number; im: number }; readonly tolerance: number; readonly precision: number; readonly E0: number },
  rows: readonly CheckRow[],
): string {
  const table = formatTable(
    ['block', 'system', 'ancilla', 'alpha', 'gates', 'max error', 'norm estimate', 'bound', 'check', 'result'],
    rows.map((r) => [
      r.label,
      String(r.systemQubits),
      String(r.ancillaQubits),
      Number.isNaN(r.alpha) ? '-' : r.alpha.toPrecision(6),
      Number.isNaN(r.alpha) ? '-' : String(totalOf(r.gates)),
      r.maxError === null ? '-' : r.maxError.toExponential(2),
      r.powerIteration ? `${r.powerIteration.estimate.toExponential(2)} (${r.powerIteration.iterations} it.)` : '-',
      Number.isNaN(r.errorBound) ? '-' : r.errorBound === 0 ? '0 (exact construction)' : r.errorBound.toExponential(2),
      r.method,
      RESULT[r.verdict],
    ]),
    ['left', 'right', 'right', 'right', 'right', 'right', 'right', 'right', 'left', 'left'],
  );
  const count = (v: Verdict) => rows.filter((r) => r.verdict === v).length;
  const summary = `${count('pass')} passed, ${count('fail')} failed, ${count('inconclusive')} inconclusive, ${count('skipped')} skipped (of ${rows.length})`;
  const reasons = rows.filter((r) => r.reason !== undefined).map((r) => `${r.label}: ${RESULT[r.verdict]}: ${r.reason}\n`);
  const notes = rows.flatMap((r) => r.costNotes.map((n) => `${r.label}: ${n.label}: ${n.toffoli} Toffoli gates (${n.source})\n`));
  const thresholds = `tolerance ${header.tolerance} (exact rows), precision ${header.precision} (largest accepted bound), ` +
    `z = ${header.z.re} + ${header.z.im}i, E0 = ${header.E0}`;
  return `${heading}\n${thresholds}\n${table}\n${summary}\n${reasons.join('')}${notes.join('')}` +
    'max error: largest entry error of <0_anc|U|0_anc> against the reference M/α (exhaustive: every column; columns: the\n' +
    'listed basis columns; probe (lower bound): random states, which may miss the worst direction; state: prepared\n' +
    'amplitudes against the Slater determinant of the decomposition\'s V; qubitized: a QSVT inverse too costly to run\n' +
    'whole, its queried block simulated on the sector\'s columns and the sequence applied through the 2×2 reduction of\n' +
    'Jordan\'s lemma, plus an allowance for what leaks out of the sector). norm estimate: power iteration on E†E,\n' +
    'E = <0|U|0> − M/α, a lower estimate of the operator-norm error. bound: the block\'s error bound, "0 (exact\n' +
    'construction)" when the construction is exact up to rounding. A row passes when its error is within\n' +
    'max(tolerance, bound) and its bound within the precision; a bound above the precision is INCONCLUSIVE; a skipped\n' +
    'row is too large to check (reason above). Blocks: the fast inverse block-encodes (w − A)⁻¹ with A the one-body\n' +
    'part, the direct shift w − H, each at the particle shift w = z + E0 and the hole shift w = E0 − z. Verdicts:\n' +
    'pass = within the thresholds; failed = an error beyond them was found; INCONCLUSIVE = the bound is too loose to\n' +
    'decide; skipped = too large to simulate.\n' +
    'Exit 0 when every row passed or was skipped, 1 otherwise.\n';
}
