/**
 * The `exact` command: solves a model exactly (ground level, G_ij on the frequency grid, self-energy),
 * prints a summary or the JSON object, and with --out writes green.json, green.csv, spectral.svg and
 * selfenergy.svg.
 */
import { join } from 'node:path';
import cliProgress from 'cli-progress';
import type { Command } from 'commander';
import { InputError } from '../../core/InputError.js';
import { writeFileAtomic } from '../../core/writeFileAtomic.js';
import { accessSync, constants, mkdirSync } from 'node:fs';
import { solveExact, type ExactSolution } from '../../exact/solveExact.js';
import { spectralFunction } from '../../exact/spectralFunction.js';
import { describeModel } from '../../model/describeModel.js';
import type { FermionModel, FrequencyGrid } from '../../model/FermionModel.js';
import { loadModelFile } from '../../model/loadModelFile.js';
import { greenCsv, greenJson } from '../../report/greenTables.js';
import { lineChartSvg } from '../../report/lineChartSvg.js';
import { parsePositiveNumber } from '../options.js';

export interface ExactCommandOptions {
  readonly out?: string;
  readonly json?: boolean;
  readonly eta?: string;
  readonly grid?: string;
  readonly pairs?: string;
}

/** Parses --grid from:to:points. */
export function parseGrid(text: string): FrequencyGrid {
  const parts = text.split(':');
  const bad = (why: string): InputError => new InputError(`--grid must be from:to:points (${why}), got "${text}"`);
  if (parts.length !== 3) throw bad('three fields separated by ":"');
  const [from, to] = parts.slice(0, 2).map((p) => (p.trim() === '' ? Number.NaN : Number(p)));
  if (!Number.isFinite(from) || !Number.isFinite(to)) throw bad('from and to must be finite numbers');
  if (!/^\d+$/.test(parts[2]!.trim()) || Number(parts[2]) < 1) throw bad('points must be an integer ≥ 1');
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

function summary(model: FermionModel, s: ExactSolution, notes: readonly string[]): string {
  const spin = s.sector.up === null ? 'all S_z' : `${s.sector.up} up, ${s.sector.down} down`;
  const lines = [
    `model: ${describeModel(model)}`,
    `sector: ${s.sector.electrons} electrons (${spin}), dimension ${s.sector.dimension}`,
    `ground energy: ${s.groundEnergy.toPrecision(12)} (residual ${s.residual.toExponential(2)})`,
    `degeneracy: ${s.degeneracy}`,
    `gap: ${s.gap === null ? 'none (no other level in the sector)' : s.gap.toPrecision(10)}`,
    `green's function: ${s.green.length} entries at ${s.frequencies.length} frequencies, broadening ${s.broadening}`,
    `timings: ground level ${seconds(s.timings.groundMs)}, green's function ${seconds(s.timings.greenMs)}, total ${seconds(s.timings.totalMs)}`,
    ...notes,
  ];
  return `${lines.join('\n')}\n`;
}

/** Creates DIR (and parents) and checks it is writable before any work is done. */
function prepareOutputDirectory(dir: string): void {
  try {
    mkdirSync(dir, { recursive: true });
    accessSync(dir, constants.W_OK);
  } catch (error) {
    throw new InputError(`--out: cannot write to "${dir}": ${(error as Error).message}`);
  }
}

/** Renders every output first, then writes each file atomically, so a rendering failure writes nothing. */
async function writeOutputs(dir: string, s: ExactSolution, notes: string[]): Promise<void> {
  const files: [string, string][] = [
    ['green.json', `${JSON.stringify(greenJson(s))}\n`],
    ['green.csv', greenCsv(s)],
  ];
  const diagonal = s.green.filter((e) => e.i === e.j);
  if (diagonal.length > 0) {
    const svg = await lineChartSvg({
      title: `Spectral function A_ii(ω) = −Im G_ii(ω + iη)/π, η = ${s.broadening}`,
      xTitle: 'ω (model energy units)',
      yTitle: 'A(ω) (1/energy)',
      series: diagonal.map((e) => ({ name: `A_${e.i}${e.i}`, x: s.frequencies, y: spectralFunction(e) })),
    });
    files.push(['spectral.svg', svg]);
  } else {
    notes.push('spectral.svg not written: --pairs selects no diagonal entry');
  }
  if (s.selfEnergy !== null) {
    const sigma = s.selfEnergy.filter((e) => e.i === e.j);
    const svg = await lineChartSvg({
      title: `Self-energy Σ_ii(ω + iη), η = ${s.broadening}`,
      xTitle: 'ω (model energy units)',
      yTitle: 'Σ(ω + iη) (energy units)',
      series: sigma.flatMap((e) => [
        { name: `Re Σ_${e.i}${e.i}`, x: s.frequencies, y: e.re },
        { name: `Im Σ_${e.i}${e.i}`, x: s.frequencies, y: e.im },
      ]),
    });
    files.push(['selfenergy.svg', svg]);
  } else {
    notes.push('selfenergy.svg not written: the self-energy needs all n² entries of G (drop --pairs)');
  }
  for (const [name, content] of files) writeFileAtomic(join(dir, name), content);
  notes.push(`wrote: ${files.map(([name]) => join(dir, name)).join(', ')}`);
}

/** Runs `polewright exact` in-process: writes to stdout (and stderr for progress). */
export async function exactCommand(file: string, options: ExactCommandOptions): Promise<void> {
  const eta = options.eta === undefined ? undefined : parsePositiveNumber('--eta', options.eta);
  const grid = options.grid === undefined ? undefined : parseGrid(options.grid);
  const model = loadModelFile(file);
  const pairs = options.pairs === undefined ? undefined : parsePairs(options.pairs, model.modes);
  if (options.out !== undefined) prepareOutputDirectory(options.out);
  const bar = process.stderr.isTTY
    ? new cliProgress.SingleBar({ stream: process.stderr, format: 'exact |{bar}| {value}/{total} continued fractions' }, cliProgress.Presets.shades_classic)
    : null;
  let started = false;
  const solution = solveExact(model, {
    ...(eta === undefined ? {} : { broadening: eta }),
    ...(grid === undefined ? {} : { grid }),
    ...(pairs === undefined ? {} : { pairs }),
    onProgress: (done, total) => {
      if (bar === null) return;
      if (!started) {
        bar.start(total, 0);
        started = true;
      }
      bar.update(done);
    },
  });
  if (started) bar!.stop();
  const notes: string[] = [];
  if (options.out !== undefined) await writeOutputs(options.out, solution, notes);
  else if (solution.selfEnergy === null) notes.push('self-energy not computed: it needs all n² entries of G');
  process.stdout.write(options.json === true ? `${JSON.stringify(greenJson(solution))}\n` : summary(model, solution, notes));
}

/** Adds `exact MODEL [--out DIR] [--json] [--eta η] [--grid from:to:points] [--pairs i:j,...]`. */
export function registerExactCommand(program: Command): void {
  program
    .command('exact')
    .description("exact reference: ground level, Green's function, self-energy and spectral function of a model")
    .argument('<model>', 'model file (JSON)')
    .option('--out <dir>', 'write green.json, green.csv (columns omega,i,j,re,im), spectral.svg and selfenergy.svg')
    .option('--json', 'print the result as one JSON object instead of the summary')
    .option('--eta <eta>', "broadening η > 0 (default: the model file's)")
    .option('--grid <from:to:points>', "frequency grid (default: the model file's)")
    .option('--pairs <i:j,...>', 'entries G_ij to compute (default: all n²)')
    .action((file: string, options: ExactCommandOptions) => exactCommand(file, options));
}
