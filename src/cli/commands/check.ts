/**
 * The `check` command: builds every block-encoding the pipeline uses for a model and verifies each by
 * statevector simulation against its exact operator; prints a table (or JSON) and exits 1 on a failure.
 */
import type { Command } from 'commander';
import { loadModelFile } from '../../model/loadModelFile.js';
import { describeModel } from '../../model/describeModel.js';
import { checkModelBlocks } from '../../verify/checkModelBlocks.js';
import { groundLevel } from '../../exact/groundLevel.js';
import { inversionCheckEncodings } from '../../inversion/inversionCheckEncodings.js';
import { InputError } from '../../core/InputError.js';
import type { CheckRow } from '../../verify/encodingCheck.js';
import { totalOf } from '../format/totalOf.js';
import { formatTable } from '../format/formatTable.js';
import { parsePositiveNumber } from '../options.js';

interface CheckOptions {
  readonly json?: boolean;
  readonly tolerance: string;
  readonly z?: string;
}

/** `--z re,im` → { re, im } with im > 0. */
function parseZ(text: string): { re: number; im: number } {
  const parts = text.split(',');
  const [re, im] = parts.map((p) => (p.trim() === '' ? Number.NaN : Number(p)));
  if (parts.length !== 2 || !Number.isFinite(re) || !Number.isFinite(im)) {
    throw new InputError(`--z must be two finite numbers "re,im", got "${text}"`);
  }
  if (!(im! > 0)) throw new InputError(`--z needs a positive imaginary part (z = ω + iη, η > 0), got "${text}"`);
  return { re: re!, im: im! };
}

function jsonReport(rows: readonly CheckRow[], ok: boolean): string {
  const blocks = rows.map((r) => ({
    label: r.label,
    systemQubits: r.systemQubits,
    ancillaQubits: r.ancillaQubits,
    alpha: r.alpha,
    maxError: r.maxError,
    errorBound: r.errorBound,
    gates: r.gates,
    costNotes: r.costNotes,
  }));
  return `${JSON.stringify({ ok, blocks }, null, 2)}\n`;
}

function tableReport(heading: string, rows: readonly CheckRow[], tolerance: number): string {
  const table = formatTable(
    ['block', 'system', 'ancilla', 'alpha', 'gates', 'max error', 'bound', 'check', 'result'],
    rows.map((r) => [
      r.label,
      String(r.systemQubits),
      String(r.ancillaQubits),
      r.alpha.toPrecision(6),
      String(totalOf(r.gates)),
      r.maxError.toExponential(2),
      r.errorBound === 0 ? 'exact' : r.errorBound.toExponential(2),
      r.method,
      r.passed ? 'pass' : 'FAIL',
    ]),
    ['left', 'right', 'right', 'right', 'right', 'right', 'right', 'left', 'left'],
  );
  const failed = rows.filter((r) => !r.passed).length;
  const summary = failed === 0
    ? `all ${rows.length} blocks within ${tolerance} (or their own error bound)`
    : `${failed} of ${rows.length} blocks exceed ${tolerance} (or their own error bound)`;
  const notes = rows.flatMap((r) => r.costNotes.map((n) => `${r.label}: ${n.label}: ${n.toffoli} Toffoli gates (${n.source})\n`));
  return `${heading}\n${table}\n${summary}\n${notes.join('')}` +
    'max error: largest entry error of <0_anc|U|0_anc> against M/α (exhaustive: every column; probe: random states;\n' +
    'state: prepared amplitudes against the exact Slater determinant). bound: the block\'s rigorous error bound\n' +
    '(register rounding of the fast inverse), "exact" when the construction has none.\n';
}

/** Adds `check MODEL [--json] [--tolerance τ]` to the program. */
export function registerCheckCommand(program: Command): void {
  program
    .command('check')
    .description("build the model's block-encodings and verify each against its exact operator by simulation")
    .argument('<model>', 'model file (JSON)')
    .option('--json', 'print { "ok": bool, "blocks": [...] } instead of a table')
    .option('--tolerance <tau>', 'largest accepted error', '1e-10')
    .option('--z <re,im>', 'frequency z = ω + iη of the fast-inverse and direct-shift rows (default: grid midpoint + iη)')
    .action((file: string, options: CheckOptions) => {
      const tolerance = parsePositiveNumber('--tolerance', options.tolerance);
      const z = options.z === undefined ? undefined : parseZ(options.z);
      const model = loadModelFile(file);
      const E0 = groundLevel(model).energy;
      const extra = inversionCheckEncodings(model, { E0, ...(z ? { z } : {}) }).map((row) => row.encoding);
      const rows = checkModelBlocks(model, { tolerance, extra });
      const ok = rows.every((r) => r.passed);
      process.stdout.write(options.json ? jsonReport(rows, ok) : tableReport(describeModel(model), rows, tolerance));
      if (!ok) process.exitCode = 1;
    });
}
