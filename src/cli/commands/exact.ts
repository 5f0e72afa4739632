/**
 * The `exact` command: solves a model exactly (ground level over every S_z sector unless the model file
 * fixes `spin`, G_ij on the frequency grid with truncation bounds, self-energy with a propagated bound),
 * prints a summary or the JSON object, and with --out writes green.json, green.csv, spectral.svg and
 * selfenergy.svg as one folder that replaces any earlier one whole. A ground level Lanczos cannot certify
 * is reported with exit code 1.
 */
import { accessSync, constants } from 'node:fs';
import { dirname, resolve } from 'node:path';
import cliProgress from 'cli-progress';
import type { Command } from 'commander';
import { ensureDirectory } from '../../core/ensureDirectory.js';
import { InputError } from '../../core/InputError.js';
import { checkFolderReplaceable, writeFolderAtomic } from '../../core/writeFolderAtomic.js';
import { isConvergenceError } from '../../exact/ConvergenceError.js';
import { DEFAULT_GREEN_TOLERANCE } from '../../exact/greensFunction.js';
import { solveExact, type ExactSolution } from '../../exact/solveExact.js';
import { describeModel } from '../../model/describeModel.js';
import type { FermionModel, FrequencyGrid } from '../../model/FermionModel.js';
import { loadModelFile } from '../../model/loadModelFile.js';
import { energyScale, gridProblem, MAX_BROADENING, MAX_GRID_POINTS, MIN_BROADENING } from '../../model/modelLimits.js';
import { greenCsv } from '../../report/greenTables.js';
import { exactPlots } from '../../report/exactPlots.js';
import { exactJson } from '../format/exactJson.js';
import { plural } from '../../core/plural.js';
import { parseNumberInRange } from '../options.js';

/** The files --out may write; a folder holding anything else is not replaced. */
export const OUTPUT_FILES = ['green.json', 'green.csv', 'spectral.svg', 'selfenergy.svg'] as const;

/** Accepted --tolerance range: below 1e-14 the bound cannot beat rounding in G; above 0.1 it says little. */
export const TOLERANCE_RANGE = [1e-14, 0.1] as const;

export interface ExactCommandOptions {
  readonly out?: string;
  readonly json?: boolean;
  readonly eta?: string;
  readonly grid?: string;
  readonly pairs?: string;
  readonly tolerance?: string;
}

/** Parses --grid from:to:points. */
export function parseGrid(text: string): FrequencyGrid {
  const parts = text.split(':');
  const bad = (why: string): InputError => new InputError(`--grid must be from:to:points (${why}), got "${text}"`);
  if (parts.length !== 3) throw bad('three fields separated by ":"');
  const [from, to] = parts.slice(0, 2).map((p) => (p.trim() === '' ? Number.NaN : Number(p)));
  if (!Number.isFinite(from) || !Number.isFinite(to)) throw bad('from and to must be finite numbers');
  if (!/^\d+$/.test(parts[2]!.trim()) || Number(parts[2]) < 1 || Number(parts[2]) > MAX_GRID_POINTS) {
    throw bad(`points must be an integer from 1 to ${MAX_GRID_POINTS}`);
  }
  const points = Number(parts[2]);
  if (points > 1 && !(to! > from!)) throw bad('to must be greater than from');
  return { from: from!, to: to!, points };
}

/** Parses --pairs i:j,i:j,… against the number of modes. */
export function parsePairs(text: string, modes: number): [number, number][] {
  const pairs: [number, number][] = [];
  for (const item of text.split(',')) {
    const m = /^\s*(\d+)\s*:\s*(\d+)\s*$/.exec(item);
    if (m === null) throw new InputError(`--pairs must be a list i:j,i:j,... of mode indices, got "${item}" in "${text}"`);
    const i = Number(m[1]);
    const j = Number(m[2]);
    if (i >= modes || j >= modes) {
      throw new InputError(`--pairs entry ${i}:${j} is out of range: the model has modes 0…${modes - 1}`);
    }
    if (!pairs.some(([a, b]) => a === i && b === j)) pairs.push([i, j]);
  }
  return pairs;
}

function seconds(ms: number): string {
  return `${(ms / 1000).toFixed(3)} s`;
}

function spinLine(s: ExactSolution): string {
  const sector = s.sector;
  if (sector.spinSectors === 'fixed') {
    return `spin: fixed by the model file to N↑ − N↓ = ${sector.up! - sector.down!}; the ground level and the average are restricted to that S_z sector`;
  }
  if (sector.spinSectors === 'none') return 'spin: no spin blocks; the ground level is that of the whole electron-number sector';
  const parts = sector.groundSectors.map((g) => `${g.up} up ${g.down} down (${g.states})`);
  return `spin: every S_z sector counts (the model file fixes none); ground level in ${parts.join(', ')}, averaged with equal weight`;
}

function bound(x: number): string {
  return Number.isFinite(x) ? x.toExponential(2) : 'none (the perturbation bound does not apply)';
}

function summary(model: FermionModel, s: ExactSolution, notes: readonly string[]): string {
  const spin = s.sector.up === null ? 'all S_z' : `${s.sector.up} up, ${s.sector.down} down`;
  const lines = [
    `model: ${describeModel(model)}`,
    `sector: ${plural(s.sector.electrons, 'electron')} (${spin}), dimension ${s.sector.dimension}`,
    spinLine(s),
    `ground energy: ${s.groundEnergy.toPrecision(12)} (residual ${s.residual.toExponential(2)})`,
    `degeneracy: ${s.degeneracy}`,
    `gap: ${s.gap === null ? 'none (no other level in the sector)' : s.gap.toPrecision(10)}`,
    `green's function: ${plural(s.green.length, 'entry', 'entries')} at ${plural(s.frequencies.length, 'frequency', 'frequencies')}, broadening ${s.broadening}`,
    `  error: |δG_ij| ≤ ${bound(Math.max(0, ...s.greenBound))} over all entries and frequencies ` +
      `(rigorous continued-fraction truncation bound; tolerance ${s.tolerance} of max |G|)`,
    s.selfEnergyBound === null
      ? 'self-energy: not computed (it needs all n² entries of G)'
      : `self-energy: |δΣ_ij| ≤ ${bound(Math.max(0, ...s.selfEnergyBound))} over all entries and frequencies ` +
        '(propagated from the bounds on G: ‖G⁻¹‖²‖δG‖/(1 − ‖G⁻¹‖‖δG‖))',
    `timings: ground level ${seconds(s.timings.groundMs)}, green's function ${seconds(s.timings.greenMs)}, total ${seconds(s.timings.totalMs)}`,
    ...notes,
  ];
  return `${lines.join('\n')}\n`;
}

/**
 * Checks before any work that --out can be written: its parent folder exists or can be created and is
 * writable, and DIR is new or holds only files an earlier run wrote (it is replaced whole).
 */
function prepareOutputFolder(dir: string): void {
  checkFolderReplaceable(dir, { label: '--out', onlyReplace: OUTPUT_FILES });
  const parent = dirname(resolve(dir));
  try {
    ensureDirectory(parent);
    accessSync(parent, constants.W_OK);
  } catch (error) {
    throw new InputError(`--out: cannot write to "${dir}": ${(error as Error).message}`);
  }
}

/** Renders every output first, then writes the folder in one step, so a failure leaves the earlier folder as it was. */
async function writeOutputs(dir: string, json: string, model: FermionModel, s: ExactSolution, notes: string[]): Promise<void> {
  const files = new Map<string, string>([
    ['green.json', json],
    ['green.csv', greenCsv(s)],
  ]);
  const plots = await exactPlots(s, model.name);
  if (plots.spectral !== null) files.set('spectral.svg', plots.spectral);
  if (plots.selfEnergy !== null) files.set('selfenergy.svg', plots.selfEnergy);
  notes.push(...plots.notes);
  const { replaced } = writeFolderAtomic(dir, files, { label: '--out', onlyReplace: OUTPUT_FILES });
  if (replaced) process.stderr.write(`polewright: replaced the earlier contents of "${dir}" with this run's ${plural(files.size, 'file')}\n`);
  notes.push(`wrote: ${[...files.keys()].map((name) => `${dir}/${name}`).join(', ')}`);
}

/** Parses --tolerance: a number within TOLERANCE_RANGE. */
export function parseTolerance(text: string): number {
  return parseNumberInRange('--tolerance', text, ...TOLERANCE_RANGE);
}

/** Runs `polewright exact` in-process: writes to stdout (and stderr for progress and convergence failures). */
export async function exactCommand(file: string, options: ExactCommandOptions): Promise<void> {
  const eta = options.eta === undefined ? undefined : parseNumberInRange('--eta', options.eta, MIN_BROADENING, MAX_BROADENING);
  const grid = options.grid === undefined ? undefined : parseGrid(options.grid);
  const tolerance = options.tolerance === undefined ? undefined : parseTolerance(options.tolerance);
  const model = loadModelFile(file);
  if (grid !== undefined) {
    const wrong = gridProblem(grid, energyScale(model.oneBody, model.twoBody, eta ?? model.broadening));
    if (wrong !== undefined) throw new InputError(`--grid: ${wrong}`);
  }
  const pairs = options.pairs === undefined ? undefined : parsePairs(options.pairs, model.modes);
  if (options.out !== undefined) prepareOutputFolder(options.out);
  const bar = process.stderr.isTTY
    ? new cliProgress.SingleBar({ stream: process.stderr, format: 'exact |{bar}| {value}/{total} continued fractions' }, cliProgress.Presets.shades_classic)
    : null;
  let started = false;
  let solution: ExactSolution;
  try {
    solution = solveExact(model, {
      ...(eta === undefined ? {} : { broadening: eta }),
      ...(grid === undefined ? {} : { grid }),
      ...(pairs === undefined ? {} : { pairs }),
      ...(tolerance === undefined ? {} : { tolerance }),
      onProgress: (done, total) => {
        if (bar === null) return;
        if (!started) {
          bar.start(total, 0);
          started = true;
        }
        bar.update(done);
      },
    });
  } catch (error) {
    if (!isConvergenceError(error)) throw error;
    process.stderr.write(`polewright: ${error.message}\n`);
    process.exitCode = 1;
    return;
  } finally {
    if (started) bar!.stop();
  }
  const json = `${JSON.stringify(exactJson(file, model, solution, grid ?? model.grid))}\n`;
  const notes: string[] = [];
  if (options.out !== undefined) await writeOutputs(options.out, json, model, solution, notes);
  process.stdout.write(options.json === true ? json : summary(model, solution, notes));
}

/** Adds `exact MODEL [--out DIR] [--json] [--eta η] [--grid from:to:points] [--pairs i:j,...] [--tolerance τ]`. */
export function registerExactCommand(program: Command): void {
  program
    .command('exact')
    .description("exact reference: ground level, Green's function, self-energy and spectral function of a model")
    .argument('<model>', 'model file (JSON)')
    .option('--out <dir>', 'write green.json, green.csv (columns omega,i,j,re,im,bound), spectral.svg and selfenergy.svg as one folder (an earlier one is replaced whole)')
    .option('--json', 'print the result as one JSON object instead of the summary')
    .option('--eta <eta>', `broadening η, ${MIN_BROADENING} to ${MAX_BROADENING} (default: the model file's)`)
    .option('--grid <from:to:points>', "frequency grid (default: the model file's)")
    .option('--pairs <i:j,...>', 'entries G_ij to compute (default: all n²)')
    .option(
      '--tolerance <tau>',
      `continued fractions stop when their rigorous truncation bound is at most τ × max |G| (${TOLERANCE_RANGE[0]} to ${TOLERANCE_RANGE[1]}; default ${DEFAULT_GREEN_TOLERANCE})`,
    )
    .action((file: string, options: ExactCommandOptions) => exactCommand(file, options));
}
