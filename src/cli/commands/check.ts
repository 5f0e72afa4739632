/**
 * The `check` command: builds every block-encoding the pipeline uses for a model and verifies each by statevector
 * simulation against a reference built independently of the circuit; prints a table (or JSON). Exit 0 when every row
 * passed or was skipped for size (the reason printed), 1 when a row failed or was inconclusive.
 */
import type { Command } from 'commander';
import { loadModelFile } from '../../model/loadModelFile.js';
import { describeModel } from '../../model/describeModel.js';
import { checkModelBlocks } from '../../verify/checkModelBlocks.js';
import { inversionCheckItems } from '../../verify/inversionCheckItems.js';
import { resolventCheckRows } from '../../verify/resolventCheckRows.js';
import { groundLevel } from '../../exact/groundLevel.js';
import { InputError } from '../../core/InputError.js';
import type { CheckRow } from '../../verify/encodingCheck.js';
import { formatCheckTable } from '../format/formatCheckTable.js';
import { jsonHeader } from '../format/jsonHeader.js';
import { parseComplexOption, parsePositiveNumber } from '../options.js';

interface CheckOptions {
  readonly json?: boolean;
  readonly tolerance: string;
  readonly precision: string;
  readonly z?: string;
}

/**
 * Default target for the bounds of approximate rows (fast inverses, QSVT inverses, which are built to it): small enough that
 * a zero, conjugated or mis-rotated fast inverse fails, and the precision the readout uses by default.
 */
const DEFAULT_PRECISION = '1e-6';

/** `--z re,im` or `--z a+bi` → { re, im } with im > 0. */
const parseZ = (text: string): { re: number; im: number } => parseComplexOption('--z', text, true);

function parsePrecision(text: string): number {
  const value = parsePositiveNumber('--precision', text);
  if (!(value < 1)) throw new InputError(`--precision must be below 1 (a bound on a block of norm ≤ 1), got "${text}"`);
  return value;
}

interface ReportHeader {
  readonly ok: boolean;
  readonly z: { re: number; im: number };
  readonly tolerance: number;
  readonly precision: number;
  readonly E0: number;
}

function jsonReport(file: string, header: ReportHeader, rows: readonly CheckRow[]): string {
  const blocks = rows.map((r) => ({
    label: r.label,
    systemQubits: r.systemQubits,
    ancillaQubits: r.ancillaQubits,
    alpha: r.alpha,
    maxError: r.maxError,
    errorBound: r.errorBound,
    gates: r.gates,
    costNotes: r.costNotes,
    passed: r.passed,
    method: r.method,
    verdict: r.verdict,
    ...(r.powerIteration ? { powerIteration: r.powerIteration } : {}),
    ...(r.reason === undefined ? {} : { reason: r.reason }),
  }));
  const inputs = { file, z: header.z, tolerance: header.tolerance, precision: header.precision };
  return `${JSON.stringify({ ...jsonHeader('check', inputs), ...header, blocks }, null, 2)}\n`;
}

/** Adds `check MODEL [--json] [--tolerance τ] [--precision ε] [--z re,im]` to the program. */
export function registerCheckCommand(program: Command): void {
  program
    .command('check')
    .description("build the model's block-encodings and verify each against an independent reference by simulation")
    .argument('<model>', 'model file (JSON)')
    .option('--json', 'print { ok, z, tolerance, precision, E0, blocks: [...] } instead of a table')
    .option('--tolerance <tau>', 'largest accepted error of an exact construction', '1e-10')
    .option('--precision <eps>', 'target and largest accepted error bound of the approximate constructions (fast and QSVT inverses)', DEFAULT_PRECISION)
    .option('--z <re,im>', 'frequency z = ω + iη of the fast-inverse and direct-shift rows (default: grid midpoint + iη)')
    .action((file: string, options: CheckOptions) => {
      const tolerance = parsePositiveNumber('--tolerance', options.tolerance);
      const precision = parsePrecision(options.precision);
      const given = options.z === undefined ? undefined : parseZ(options.z);
      const model = loadModelFile(file);
      const z = given ?? { re: (model.grid.from + model.grid.to) / 2, im: model.broadening };
      const E0 = groundLevel(model).energy;
      const extra = inversionCheckItems(model, { E0, z, fastInverse: { precision } });
      const rows = [...checkModelBlocks(model, { tolerance, precision, extra }), ...resolventCheckRows(model, { E0, z }, { tolerance, precision })];
      const ok = rows.every((r) => r.verdict === 'pass' || r.verdict === 'skipped');
      const header = { ok, z, tolerance, precision, E0 };
      process.stdout.write(options.json ? jsonReport(file, header, rows) : formatCheckTable(describeModel(model), header, rows));
      if (!ok) process.exitCode = 1;
    });
}
