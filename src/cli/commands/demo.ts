/**
 * The `demo` command: the main job on the built-in scenario (demoScenario) — the exact spectral function A_00(ω) with
 * gate-level points of both routes overlaid (spectrum.svg), the table of gate-level against exact values with their
 * bounds (table.txt, points.csv), the OpenQASM files of one point with their manifest (circuits/, as `build` writes
 * them) and the `check` table of the model's blocks (check.txt); the whole folder written atomically, progress on stderr.
 */
import type { Command } from 'commander';
import { solveExact } from '../../exact/solveExact.js';
import { spectralFunction } from '../../exact/spectralFunction.js';
import { describeModel } from '../../model/describeModel.js';
import { loadModelFile } from '../../model/loadModelFile.js';
import { estimateGreen, type GreenEstimate } from '../../readout/estimateGreen.js';
import { demoSpectrumSvg } from '../../report/demoSpectrumSvg.js';
import { checkModelBlocks } from '../../verify/checkModelBlocks.js';
import { inversionCheckItems } from '../../verify/inversionCheckItems.js';
import { resolventCheckRows } from '../../verify/resolventCheckRows.js';
import { formatCheckTable } from '../format/formatCheckTable.js';
import { formatTable } from '../format/formatTable.js';
import { DEMO_FREQUENCIES, DEMO_MODEL_PATH, DEMO_PAIR, DEMO_POINT, DEMO_PRECISION, demoPointFiles } from '../readout/demoScenario.js';
import { exactGreenAt, type ExactValue } from '../readout/exactGreenAt.js';
import { formatComplex } from '../readout/formatComplex.js';
import type { Route } from '../readout/parseReadoutOptions.js';
import { routeResolvent } from '../readout/routeResolvent.js';
import { solvedGround } from '../readout/solvedGround.js';
import { checkFolderReplaceable, topLevelNames, writeFolderAtomic } from '../../core/writeFolderAtomic.js';

/** Target and largest accepted bound of the approximate rows of the demo's check (as `polewright check`'s default). */
const CHECK_PRECISION = 1e-6;

export interface DemoCommandOptions {
  readonly out: string;
}

const ROUTES: readonly Route[] = ['preconditioned', 'direct'];

interface DemoPoint {
  readonly route: Route;
  readonly omega: number;
  readonly estimate: GreenEstimate;
  readonly exact: ExactValue;
  /** Largest QSVT degree of the two parts' resolvents. */
  readonly degree: number;
  readonly seconds: number;
}

const progress = (text: string): void => {
  process.stderr.write(`demo: ${text}\n`);
};

const difference = (p: DemoPoint): number => Math.hypot(p.estimate.value.re - p.exact.value.re, p.estimate.value.im - p.exact.value.im);

function pointsTable(points: readonly DemoPoint[]): string {
  return formatTable(
    ['omega', 'route', 'gate level G_00', 'exact G_00', 'difference', 'error bound', 'alpha', 'degree', 'qubits', 'seconds'],
    points.map((p) => [
      p.omega.toFixed(2),
      p.route,
      formatComplex(p.estimate.value, 9),
      formatComplex(p.exact.value, 9),
      difference(p).toExponential(2),
      p.estimate.errorBound.toExponential(2),
      Math.max(...p.estimate.parts.map((part) => part.alpha)).toPrecision(4),
      String(p.degree),
      String(p.estimate.qubits),
      p.seconds.toFixed(2),
    ]),
    ['right', 'left', 'right', 'right', 'right', 'right', 'right', 'right', 'right', 'right'],
  );
}

function pointsCsv(points: readonly DemoPoint[]): string {
  const rows = points.map((p) => [
    p.omega, p.route, p.estimate.value.re, p.estimate.value.im, p.exact.value.re, p.exact.value.im,
    difference(p), p.estimate.errorBound, -p.estimate.value.im / Math.PI, -p.exact.value.im / Math.PI,
  ].join(','));
  return `omega,route,re,im,exact_re,exact_im,difference,error_bound,A,A_exact\n${rows.join('\n')}\n`;
}

/** Runs `polewright demo` in-process. */
export async function demoCommand(options: DemoCommandOptions): Promise<void> {
  const started = performance.now();
  checkFolderReplaceable(options.out, { label: '--out' });
  const model = loadModelFile(DEMO_MODEL_PATH);
  const [i, j] = DEMO_PAIR;
  progress(`${describeModel(model)}: exact spectral function on ${model.grid.points} frequencies`);
  const solution = solveExact(model, { pairs: [DEMO_PAIR] });
  const ground = solvedGround(model, '', solution.ground);
  const zs = DEMO_FREQUENCIES.map((omega) => ({ re: omega, im: model.broadening }));
  const exact = exactGreenAt(model, ground.level, DEMO_PAIR, zs);
  const points: DemoPoint[] = [];
  for (const route of ROUTES) {
    const resolvent = routeResolvent(model, route, DEMO_PRECISION);
    zs.forEach((z, k) => {
      const t0 = performance.now();
      const estimate = estimateGreen({
        modes: model.modes, electrons: model.electrons, groundEnergy: ground.energy, states: ground.states,
        pair: DEMO_PAIR, z, resolvent: resolvent.factory, targetPrecision: DEMO_PRECISION,
      });
      const seconds = (performance.now() - t0) / 1000;
      const degree = Math.max(...estimate.parts.map((part) => resolvent.reportOf(part.resolvent)?.degree ?? 0));
      points.push({ route, omega: z.re, estimate, exact: exact[k]!, degree, seconds });
      progress(`${route} route, ω = ${z.re}: G_${i}${j} = ${formatComplex(estimate.value, 8)} (${seconds.toFixed(1)} s)`);
    });
  }
  progress('checking every block of the model against its exact operator');
  const checkZ = { re: DEMO_POINT.omega, im: model.broadening };
  const thresholds = { tolerance: 1e-10, precision: CHECK_PRECISION };
  const checkRows = [
    ...checkModelBlocks(model, { ...thresholds, extra: inversionCheckItems(model, { E0: ground.energy, z: checkZ, fastInverse: { precision: CHECK_PRECISION } }) }),
    ...resolventCheckRows(model, { E0: ground.energy, z: checkZ }, thresholds),
  ];
  const checkText = formatCheckTable(describeModel(model), { z: checkZ, ...thresholds, E0: ground.energy }, checkRows);
  progress(`writing the OpenQASM files of ω = ${DEMO_POINT.omega} (${DEMO_POINT.route} route)`);
  const circuits = demoPointFiles(model, ground);
  const spectral = spectralFunction(solution.green[0]!);
  const svg = await demoSpectrumSvg({
    title: `${model.name}: spectral function A_${i}${j}(ω) = −Im G_${i}${j}(ω + iη)/π, η = ${model.broadening}`,
    xTitle: 'ω (model energy units)',
    yTitle: 'A(ω) (1/energy)',
    seriesTitle: 'how the value was computed',
    line: { name: `exact (Lanczos) A_${i}${j}`, x: solution.frequencies, y: spectral },
    points: ROUTES.map((route) => {
      const mine = points.filter((p) => p.route === route);
      return { name: `gate level, ${route} route`, x: mine.map((p) => p.omega), y: mine.map((p) => -p.estimate.value.im / Math.PI) };
    }),
  });
  const table = pointsTable(points);
  const worst = Math.max(...points.map(difference));
  const largestBound = Math.max(...points.map((p) => p.estimate.errorBound));
  const summary = [
    `model: ${describeModel(model)}; ground energy ${ground.energy.toPrecision(12)} (${ground.description})`,
    `G_${i}${j}(ω + iη) from the Hadamard-test circuits (exact expectation, precision ${DEMO_PRECISION}) against the exact solver:`,
    table,
    `largest difference ${worst.toExponential(2)}, largest error bound ${largestBound.toExponential(2)} (rigorous; each difference is within its bound: ${points.every((p) => difference(p) <= p.estimate.errorBound + p.exact.bound) ? 'yes' : 'NO'})`,
  ].join('\n');
  const files = new Map<string, string>([
    ['spectrum.svg', svg],
    ['table.txt', `${summary}\n`],
    ['points.csv', pointsCsv(points)],
    ['check.txt', checkText],
  ]);
  for (const [name, content] of circuits) files.set(`circuits/${name}`, content);
  writeFolderAtomic(options.out, files, { label: '--out', onlyReplace: topLevelNames(files) });
  const seconds = (performance.now() - started) / 1000;
  const passed = checkRows.filter((r) => r.verdict === 'pass').length;
  process.stdout.write(
    `${summary}\ncheck: ${passed} of ${checkRows.length} blocks pass (check.txt)\n` +
      `wrote: ${options.out}/spectrum.svg, table.txt, points.csv, check.txt, circuits/ (${[...circuits.keys()].filter((name) => name.endsWith('.qasm')).length} OpenQASM files — Hadamard tests and block-encodings — with operator files, manifest.json, README.txt)\n` +
      `run time: ${seconds.toFixed(1)} s\n`,
  );
}

/** Adds `demo [--out DIR]` to the program. */
export function registerDemoCommand(program: Command): void {
  program
    .command('demo')
    .description('the main job on the built-in double-dot scenario: exact spectral function, gate-level points of both routes, circuits, checks')
    .option('--out <dir>', 'output folder (written whole or not at all)', 'out/demo')
    .action((options: DemoCommandOptions) => demoCommand(options));
}
