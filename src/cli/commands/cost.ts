/**
 * The `cost` command: logical resources of the Green's-function circuits on both routes (preconditioned, direct) for a
 * model of any size — counted on the circuit hierarchy, never simulated — as a table with its assumptions, as JSON,
 * or (`--vary KEY=v1,…`) as a sweep written to DIR/cost.csv and DIR/cost.svg.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Command } from 'commander';
import { InputError } from '../../core/InputError.js';
import { writeFileAtomic } from '../../core/writeFileAtomic.js';
import { compareRoutes, ROUTES, type CompareOptions, type RouteComparison } from '../../cost/compareRoutes.js';
import type { GreenCost, UnavailableRoute } from '../../cost/greenCost.js';
import { varyModelInput } from '../../cost/varyModelInput.js';
import { logLogSlope } from '../../report/logLogSlope.js';
import { describeModel } from '../../model/describeModel.js';
import type { FermionModel } from '../../model/FermionModel.js';
import { loadModelFile } from '../../model/loadModelFile.js';
import { parseModel } from '../../model/parseModel.js';
import { costChartSvg } from '../../report/costChartSvg.js';
import { costCsv, type CostCsvRow } from '../../report/costCsv.js';
import { jsonHeader } from '../format/jsonHeader.js';
import { formatTable } from '../format/formatTable.js';
import { parseFiniteNumber, parseNonNegativeInteger, parsePositiveNumber } from '../options.js';

interface CostCliOptions {
  readonly pair: string;
  readonly z?: string;
  readonly precision: string;
  readonly energy?: string;
  readonly prepToffoli?: string;
  readonly toffoliT: string;
  readonly multiControl: string;
  readonly bEncoding: string;
  readonly wholeFock?: boolean;
  readonly json?: boolean;
  readonly vary?: string;
  readonly out?: string;
}

function parsePair(text: string, modes: number): [number, number] {
  const parts = text.split(',');
  if (parts.length !== 2) throw new InputError(`--pair must be two mode indices "i,j", got "${text}"`);
  const [i, j] = parts.map((p) => parseNonNegativeInteger('--pair', p)) as [number, number];
  if (i >= modes || j >= modes) throw new InputError(`--pair ${text}: modes are 0…${modes - 1}`);
  return [i, j];
}

function parseZ(text: string): { re: number; im: number } {
  const parts = text.split(',');
  if (parts.length !== 2) throw new InputError(`--z must be two finite numbers "re,im", got "${text}"`);
  const re = parseFiniteNumber('--z', parts[0]!);
  const im = parseFiniteNumber('--z', parts[1]!);
  if (!(im > 0)) throw new InputError(`--z needs a positive imaginary part (z = ω + iη, η > 0), got "${text}"`);
  return { re, im };
}

function parseVary(text: string): { key: string; values: number[] } {
  const at = text.indexOf('=');
  if (at <= 0) throw new InputError(`--vary must be KEY=v1,v2,…, got "${text}"`);
  const key = text.slice(0, at).trim();
  const list = text.slice(at + 1).trim();
  if (list === '') throw new InputError(`--vary ${key}: the value list is empty`);
  return { key, values: list.split(',').map((v) => parseFiniteNumber(`--vary ${key}`, v)) };
}

function compareOptions(model: FermionModel, options: CostCliOptions): CompareOptions {
  const precision = parsePositiveNumber('--precision', options.precision);
  const toffoliT = Number(options.toffoliT);
  if (toffoliT !== 4 && toffoliT !== 7) throw new InputError(`--toffoli-t must be 4 or 7, got "${options.toffoliT}"`);
  const multiControl = options.multiControl;
  if (multiControl !== 'measured' && multiControl !== 'clean' && multiControl !== 'dirty') {
    throw new InputError(`--multi-control must be measured, clean or dirty, got "${multiControl}"`);
  }
  const bEncoding = options.bEncoding;
  if (bEncoding !== 'pauli' && bEncoding !== 'arithmetic' && bEncoding !== 'cheaper') {
    throw new InputError(`--b-encoding must be pauli, arithmetic or cheaper, got "${bEncoding}"`);
  }
  const z = options.z === undefined ? { re: (model.grid.from + model.grid.to) / 2, im: model.broadening } : parseZ(options.z);
  return {
    pair: parsePair(options.pair, model.modes),
    z,
    precision,
    toffoliT,
    multiControl,
    bEncoding,
    window: options.wholeFock !== true,
    ...(options.energy === undefined ? {} : { energy: parseFiniteNumber('--energy', options.energy) }),
    ...(options.prepToffoli === undefined ? {} : { prepToffoli: parseNonNegativeInteger('--prep-toffoli', options.prepToffoli) }),
  };
}

const FIGURES = ['logicalQubits', 'toffoli', 'tCount', 'rotations', 'queries', 'shots', 'totalToffoli', 'alpha', 'degree', 'errorBudget', 'parts', 'prepToffoli', 'bEncoding'];

function routeJson(cost: GreenCost | UnavailableRoute): Record<string, unknown> {
  if ('unavailable' in cost) return { available: false, reason: cost.unavailable, ...Object.fromEntries(FIGURES.map((f) => [f, null])) };
  return {
    available: true,
    precisionMet: cost.precisionMet,
    logicalQubits: cost.logicalQubits,
    toffoli: cost.toffoli,
    tCount: cost.tCount,
    rotations: cost.rotations,
    queries: cost.queries,
    shots: { plain: cost.shots, amplitudeEstimationCalls: cost.amplitudeEstimationCalls },
    totalToffoli: { plain: cost.totalToffoli, amplitudeEstimation: cost.totalToffoliAmplitudeEstimation },
    alpha: cost.alpha,
    degree: cost.degree,
    errorBudget: {
      target: cost.budget.target,
      encodingPerPart: cost.budget.encodingPerPart,
      synthesisPerPart: cost.budget.synthesisPerPart,
      samplingPerEstimate: cost.budget.samplingPerEstimate,
      parts: cost.parts.map((p) => ({
        part: p.part,
        encodingErrorOnG: p.alpha * p.encodingErrorBound,
        rotationError: p.rotationError,
        tPerRotation: p.perRun.tPerRotation,
        degree: p.degree,
        registerBits: p.registerBits,
        precisionMet: p.precisionMet,
      })),
    },
    parts: cost.parts.map((p) => ({
      part: p.part,
      w: p.w,
      electrons: p.electrons,
      alpha: p.alpha,
      logicalQubits: p.logicalQubits,
      toffoli: p.perRun.toffoli,
      tCount: p.perRun.tCount,
      rotations: p.perRun.rotations,
      cliffords: p.perRun.cliffords,
      overrides: p.perRun.charges,
      shotsPerTest: p.plainShotsPerTest,
      bEncoding: p.bEncoding ?? null,
      notes: p.notes,
    })),
    prepToffoli: cost.prepToffoli,
    bEncoding: cost.bEncoding ?? null,
  };
}

const sci = (x: number): string => (Math.abs(x) >= 1e6 ? x.toExponential(3) : String(Math.round(x * 1000) / 1000));

function tableReport(model: FermionModel, comparison: RouteComparison, options: CompareOptions): string {
  const { preconditioned: p, direct: d } = comparison.routes;
  const cell = (c: GreenCost | UnavailableRoute, f: (c: GreenCost) => number): string => ('unavailable' in c ? 'n/a' : sci(f(c)));
  const row = (label: string, f: (c: GreenCost) => number): string[] => [label, cell(p, f), cell(d, f)];
  const table = formatTable(
    ['per Hadamard-test run unless stated', 'preconditioned', 'direct'],
    [
      row('logical qubits (peak)', (c) => c.logicalQubits),
      row('Toffoli', (c) => c.toffoli),
      row('T count', (c) => c.tCount),
      row('arbitrary rotations', (c) => c.rotations),
      row('QSVT degree', (c) => c.degree),
      row('alpha of the tested encoding', (c) => c.alpha),
      row('shots, plain sampling (all tests)', (c) => c.shots),
      row('controlled-U calls, amplitude estimation', (c) => c.amplitudeEstimationCalls),
      row('Toffoli in all, plain sampling', (c) => c.totalToffoli),
      row('Toffoli in all, amplitude estimation', (c) => c.totalToffoliAmplitudeEstimation),
    ],
    ['left', 'right', 'right'],
  );
  const notes = ROUTES.flatMap((route) => {
    const cost = comparison.routes[route];
    if ('unavailable' in cost) return [`  ${route}: NOT AVAILABLE: ${cost.unavailable}`];
    return cost.parts.flatMap((part) => part.notes.map((n) => `  ${route} (${part.part}): ${n}`));
  });
  return (
    `${describeModel(model)}\nG_${options.pair[0]}${options.pair[1]}(z) at z = ${options.z.re} + ${options.z.im}i to |dG| <= ${options.precision}\n${table}\n` +
    `Assumptions:\n${comparison.assumptions.map((a) => `  - ${a}`).join('\n')}\n${notes.join('\n')}\n`
  );
}

const CSV_COLUMNS = ['logicalQubits', 'toffoli', 'tCount', 'rotations', 'queries', 'degree', 'alpha', 'shots', 'totalToffoli'];

/** The fitted exponents of Toffoli and queries against the varied parameter, one line per route. */
function exponentLines(key: string, rows: readonly CostCsvRow[]): string[] {
  return ROUTES.map((route) => {
    const mine = rows.filter((r) => r.route === route);
    const x = mine.map((r) => r.parameter);
    const fit = (column: string): string => {
      const b = logLogSlope(x, mine.map((r) => r.values[column]!));
      return b === null ? 'n/a' : b.toFixed(2);
    };
    return `${route}: Toffoli per run ~ ${key}^${fit('toffoli')}, queries ~ ${key}^${fit('queries')} (least-squares fit of log against log over ${mine.length} values)`;
  });
}

async function sweep(file: string, options: CostCliOptions, out: string): Promise<string> {
  const { key, values } = parseVary(options.vary!);
  const raw: unknown = JSON.parse(readFileSync(file, 'utf8').replace(/^\uFEFF/, ''));
  const rows: CostCsvRow[] = [];
  for (const value of values) {
    const model = parseModel(varyModelInput(raw, key, value), file);
    const comparison = compareRoutes(model, compareOptions(model, options));
    for (const route of ROUTES) {
      const c = comparison.routes[route];
      if ('unavailable' in c) continue;
      rows.push({ parameter: value, route, values: { logicalQubits: c.logicalQubits, toffoli: c.toffoli, tCount: c.tCount, rotations: c.rotations, queries: Object.values(c.queries)[0] ?? 0, degree: c.degree, alpha: c.alpha, shots: c.shots, totalToffoli: c.totalToffoli } });
    }
  }
  const svg = await costChartSvg({
    title: `Toffoli per Hadamard-test run against ${key}`,
    xTitle: key,
    yTitle: 'Toffoli per run',
    series: ROUTES.map((route) => {
      const mine = rows.filter((r) => r.route === route);
      return { name: route, x: mine.map((r) => r.parameter), y: mine.map((r) => r.values['toffoli']!) };
    }),
  });
  writeFileAtomic(join(out, 'cost.csv'), costCsv(key, CSV_COLUMNS, rows));
  writeFileAtomic(join(out, 'cost.svg'), svg);
  const missing = values.length * ROUTES.length - rows.length;
  const skipped = missing === 0 ? '' : `; ${missing} route/value pairs not available, left out`;
  return `wrote ${join(out, 'cost.csv')} and ${join(out, 'cost.svg')} (${values.length} values of ${key}, both routes${skipped})\n${exponentLines(key, rows).join('\n')}\n`;
}

/** Adds `cost MODEL [options]` to the program. */
export function registerCostCommand(program: Command): void {
  program
    .command('cost')
    .description("logical resources (qubits, Toffoli, T, rotations, shots) of G_ij(z) on both routes, without simulating")
    .argument('<model>', 'model file (JSON)')
    .option('--pair <i,j>', 'Green\'s-function entry', '0,0')
    .option('--z <re,im>', 'frequency z = ω + iη (default: grid midpoint + iη)')
    .option('--precision <eps>', 'target |ΔG_ij(z)|', '1e-2')
    .option('--energy <E0>', 'ground energy (default: a rigorous lower bound, stated)')
    .option('--prep-toffoli <N>', 'Toffolis of one ground-state preparation (default: not counted)')
    .option('--toffoli-t <4|7>', 'T gates per Toffoli', '4')
    .option('--multi-control <method>', 'multi-controlled X: measured, clean or dirty', 'measured')
    .option('--b-encoding <kind>', "B' of the preconditioned route: pauli, arithmetic (B diagonal) or cheaper (fewer Toffolis over all shots)", 'cheaper')
    .option('--whole-fock', 'preconditioned route on the whole Fock space (no electron-number window)')
    .option('--json', 'print { "preconditioned": {...}, "direct": {...} }')
    .option('--vary <KEY=v1,v2,...>', 'rerun over values of one model parameter; needs --out')
    .option('--out <dir>', 'directory for cost.csv and cost.svg (with --vary)')
    .action(async (file: string, options: CostCliOptions) => {
      const model = loadModelFile(file);
      if (options.vary !== undefined) {
        if (options.out === undefined) throw new InputError('--vary needs --out DIR for cost.csv and cost.svg');
        process.stdout.write(await sweep(file, options, options.out));
        return;
      }
      const compare = compareOptions(model, options);
      const comparison = compareRoutes(model, compare);
      if (options.json) {
        const json = Object.fromEntries(ROUTES.map((r) => [r, routeJson(comparison.routes[r])]));
        const inputs = { model: file, ...compare, z: [compare.z.re, compare.z.im], energy: compare.energy ?? null, prepToffoli: compare.prepToffoli ?? null };
        process.stdout.write(`${JSON.stringify({ ...jsonHeader('cost', inputs), ...json, groundEnergy: comparison.groundEnergy, groundEnergySource: comparison.groundEnergySource, assumptions: comparison.assumptions }, null, 2)}\n`);
        return;
      }
      process.stdout.write(tableReport(model, comparison, compare));
    });
}
