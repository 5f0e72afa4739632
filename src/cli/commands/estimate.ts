/**
 * The `estimate` command: G_ij(z) from the synthesized Hadamard-test circuits (QSVT resolvent, preconditioned or
 * direct route) on the exact ground state, by exact expectation (with a rigorous error bound) or by seeded shots (with
 * a standard error), next to the exact solver's value; at one z or along the real axis (--grid, η from the model).
 */
import type { Command } from 'commander';
import { ancillaIndices } from '../../blocks/BlockEncoding.js';
import { InputError, isInputError } from '../../core/InputError.js';
import { frequencyGrid } from '../../exact/frequencyGrid.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { describeModel } from '../../model/describeModel.js';
import { loadModelFile } from '../../model/loadModelFile.js';
import { estimateGreen, type GreenEstimate } from '../../readout/estimateGreen.js';
import type { GreenPart } from '../../readout/greenParts.js';
import { greenParts } from '../../readout/greenParts.js';
import { prepareBlockOnZeroAncillas } from '../../sim/simulateBlockOnZeroAncillas.js';
import { MAX_SIMULATION_WORK } from '../../verify/checkModelBlocks.js';
import { formatTable } from '../format/formatTable.js';
import { jsonHeader } from '../format/jsonHeader.js';
import { MAX_SHOTS, parseNonNegativeInteger, parsePositiveInteger, parsePositiveNumber } from '../options.js';
import { exactGreenAt, type ExactValue } from '../readout/exactGreenAt.js';
import { formatComplex } from '../readout/formatComplex.js';
import { VERSION } from '../../core/version.js';
import { parseComplexZ, parsePair, parseRoute } from '../readout/parseReadoutOptions.js';
import { partsSummary, partsTable } from '../readout/partsSummary.js';
import { routeResolvent } from '../readout/routeResolvent.js';
import { solvedGround } from '../readout/solvedGround.js';
import { parseGrid } from './exact.js';

export interface EstimateCommandOptions {
  readonly pair: string;
  readonly z?: string;
  readonly grid?: string;
  readonly route: string;
  readonly shots?: string;
  readonly seed: string;
  readonly precision: string;
  readonly loadState?: boolean;
  readonly json?: boolean;
}

/**
 * Most amplitude updates (runs × primitive operations per run × 2^simulated qubits) an estimate may simulate:
 * 2^34 ≈ 1.7e10, a quarter of the per-row limit `check` uses (MAX_SIMULATION_WORK = 2^36), because estimate refuses
 * where check only skips a row: hubbard-ring4 readouts of 18 simulated qubits ran at about 6e8 updates per second on
 * one core, so 2^36 would allow two minutes without output and 2^34 keeps a run under about 30 s. A larger readout is
 * refused before it starts; `build` writes its circuits and `cost` counts them without simulating.
 */
export const MAX_ESTIMATE_WORK = MAX_SIMULATION_WORK / 4;

/**
 * Refuses, before any simulation, a run whose work exceeds MAX_ESTIMATE_WORK: adds up the work of every frequency's
 * parts (each compiled once here for its size; their encodings are kept by the resolvent factory for the run) and stops
 * at the first frequency that crosses the limit. A part too large to compile is left to estimateGreen, which names it.
 */
function refuseOversizedSimulation(zs: readonly ComplexScalar[], partsAt: (z: ComplexScalar) => readonly GreenPart[], states: number): void {
  let work = 0;
  for (const [k, z] of zs.entries()) {
    for (const part of partsAt(z)) {
      try {
        const run = prepareBlockOnZeroAncillas(part.encoding.block, { idleZero: ancillaIndices(part.encoding) });
        work += states * run.operations * 2 ** run.stateQubits;
      } catch (error) {
        if (isInputError(error)) return;
        throw error;
      }
    }
    if (work > MAX_ESTIMATE_WORK) {
      const counted = k + 1 < zs.length ? ` for the first ${k + 1} of ${zs.length} frequencies` : '';
      throw new InputError(
        `estimate: simulating this readout takes about ${work.toExponential(1)} amplitude updates${counted} ` +
          `(runs × operations per run × 2^simulated qubits), beyond the limit ${MAX_ESTIMATE_WORK.toExponential(1)} (2^34); ` +
          'write the circuits with `polewright build` or count their resources with `polewright cost` instead',
      );
    }
  }
}

const pairOf = (c: ComplexScalar): [number, number] => [c.re, c.im];
const distance = (a: ComplexScalar, b: ComplexScalar): number => Math.hypot(a.re - b.re, a.im - b.im);

function pointJson(estimate: GreenEstimate, exact: ExactValue) {
  return {
    z: pairOf(estimate.z),
    value: pairOf(estimate.value),
    exact: pairOf(exact.value),
    exactBound: exact.bound,
    difference: distance(estimate.value, exact.value),
    errorBound: estimate.errorBound,
    stdError: estimate.stdError === null ? null : pairOf(estimate.stdError),
  };
}

function errorLine(estimate: GreenEstimate): string {
  const bound = `error bound: ${estimate.errorBound.toExponential(2)} (rigorous, without sampling noise: the encodings' α × error bound ` +
    `${estimate.boundParts.encoding.toExponential(2)} + floating-point allowance ${estimate.boundParts.rounding.toExponential(2)})`;
  if (estimate.stdError === null) return bound;
  return `standard error: ${formatComplex(estimate.stdError, 3)} (${estimate.shots} shots per Hadamard test)\n${bound}`;
}

/** Runs `polewright estimate` in-process (stdout for the result, stderr for progress). */
export async function estimateCommand(file: string, options: EstimateCommandOptions): Promise<void> {
  const started = performance.now();
  const route = parseRoute(options.route);
  const precision = parsePositiveNumber('--precision', options.precision);
  const shots = options.shots === undefined ? undefined : parsePositiveInteger('--shots', options.shots, MAX_SHOTS);
  const seed = parseNonNegativeInteger('--seed', options.seed);
  if ((options.z === undefined) === (options.grid === undefined)) throw new InputError('estimate needs exactly one of --z re,im and --grid from:to:points');
  const single = options.z === undefined ? undefined : parseComplexZ(options.z);
  const grid = options.grid === undefined ? undefined : parseGrid(options.grid);
  const model = loadModelFile(file);
  const pair = parsePair(options.pair, model.modes);
  const zs = single !== undefined ? [single] : Array.from(frequencyGrid(grid!), (omega) => ({ re: omega, im: model.broadening }));
  const ground = solvedGround(model, '; `polewright build --energy E0` writes the circuits without solving the model');
  const resolvent = routeResolvent(model, route, precision);
  refuseOversizedSimulation(
    zs,
    (z) => greenParts({ modes: model.modes, electrons: model.electrons, groundEnergy: ground.energy, pair, z, resolvent: resolvent.factory }),
    ground.states.length,
  );
  const exact = exactGreenAt(model, ground.level, pair, zs);
  const progress = process.stderr.isTTY === true;
  const estimates = zs.map((z, k) =>
    estimateGreen({
      modes: model.modes,
      electrons: model.electrons,
      groundEnergy: ground.energy,
      states: ground.states,
      pair,
      z,
      resolvent: resolvent.factory,
      loadState: options.loadState === true,
      ...(shots === undefined ? {} : { shots: { count: shots, seed: seed + k } }),
      targetPrecision: precision,
      onProgress: (done, total, label) => {
        if (progress) process.stderr.write(`estimate: z ${k + 1}/${zs.length}, run ${done}/${total} (${label})\n`);
      },
    }),
  );
  const seconds = (performance.now() - started) / 1000;
  const first = estimates[0]!;
  const parts = partsSummary(first.parts, resolvent);
  const mode = shots === undefined ? 'exact expectation' : `${shots} shots per Hadamard test, seed ${seed}`;
  const [i, j] = pair;
  if (options.json === true) {
    const inputs = {
      model: file, pair, z: single === undefined ? null : pairOf(single), grid: grid ?? null, route, shots: shots ?? null, seed, precision,
      loadState: options.loadState === true,
    };
    const common = {
      ...jsonHeader('estimate', inputs),
      version: VERSION,
      model: model.name,
      pair,
      route,
      mode: shots === undefined ? 'exact' : 'shots',
      shots: shots ?? null,
      seed: shots === undefined ? null : seed,
      precision,
      groundEnergy: ground.energy,
      states: ground.states.length,
      initialState: ground.description,
      qubits: first.qubits,
      alpha: Math.max(...first.parts.map((p) => p.alpha)),
      degree: Math.max(...parts.map((p) => p.degree ?? 0)),
      encodings: parts,
      shotPlan: first.shotPlan,
      seconds,
    };
    const json = single !== undefined
      ? {
          ...common,
          ...pointJson(first, exact[0]!),
          boundParts: first.boundParts,
          parts: Object.fromEntries(['particle', 'hole'].map((name) => [name, pairOf(first.parts.find((p) => p.part === name)?.value ?? { re: 0, im: 0 })])),
        }
      : { ...common, eta: model.broadening, points: estimates.map((e, k) => pointJson(e, exact[k]!)) };
    process.stdout.write(`${JSON.stringify(json, null, 2)}\n`);
    return;
  }
  const lines = [`model: ${describeModel(model)}`];
  if (single !== undefined) {
    lines.push(
      `G_${i}${j}(z) at z = ${formatComplex(single, 6)}, ${route} route, ${mode}`,
      `initial state: ${ground.description}, E0 = ${ground.energy.toPrecision(12)}`,
      partsTable(parts),
      `value:       ${formatComplex(first.value)}`,
      `exact:       ${formatComplex(exact[0]!.value)} (exact solver; continued-fraction bound ${exact[0]!.bound.toExponential(2)})`,
      `difference:  ${distance(first.value, exact[0]!.value).toExponential(2)}`,
      errorLine(first),
    );
  } else {
    lines.push(
      `G_${i}${j}(ω + iη), η = ${model.broadening}, ${route} route, ${mode}; initial state: ${ground.description}`,
      formatTable(
        ['omega', 'gate level', 'exact', 'difference', shots === undefined ? 'error bound' : 'std error'],
        estimates.map((e, k) => [
          e.z.re.toPrecision(6),
          formatComplex(e.value, 8),
          formatComplex(exact[k]!.value, 8),
          distance(e.value, exact[k]!.value).toExponential(2),
          e.stdError === null ? e.errorBound.toExponential(2) : formatComplex(e.stdError, 2),
        ]),
        ['right', 'right', 'right', 'right', 'right'],
      ),
      `qubits: ${first.qubits}, alpha: ${Math.max(...first.parts.map((p) => p.alpha)).toPrecision(6)}`,
    );
  }
  const plan = first.shotPlan;
  lines.push(
    `shots for precision ${plan.precision}: ${plan.shotsPerTest} per Hadamard test (${plan.tests} tests, ${plan.totalShots} in all; N = ⌈Σ s²/ε²⌉, s = sign·α/states)`,
    `run time: ${seconds.toFixed(2)} s`,
  );
  process.stdout.write(`${lines.join('\n')}\n`);
}

/** Adds `estimate MODEL --pair i,j (--z re,im | --grid from:to:points) [...]` to the program. */
export function registerEstimateCommand(program: Command): void {
  program
    .command('estimate')
    .description("G_ij(z) from the synthesized Hadamard-test circuits on the exact ground state, next to the exact value")
    .argument('<model>', 'model file (JSON)')
    .requiredOption('--pair <i,j>', 'the entry G_ij')
    .option('--z <re,im>', 'one frequency z = ω + iη (η > 0)')
    .option('--grid <from:to:points>', "evaluate along the real axis, z = ω + iη with the model's η")
    .option('--route <route>', 'preconditioned (fast inverse of the one-body part) or direct', 'preconditioned')
    .option('--shots <n>', 'sample every Hadamard test n times instead of the exact expectation')
    .option('--seed <s>', 'seed of the shot sampling', '1')
    .option('--precision <eps>', 'precision of the resolvent encodings (and of the reported shot count)', '1e-6')
    .option('--load-state', 'load the ground vector into the simulator instead of simulating its preparation circuit')
    .option('--json', 'print one JSON object instead of the summary')
    .action((file: string, options: EstimateCommandOptions) => estimateCommand(file, options));
}
