/**
 * bench-end-to-end (`npx tsx scripts/bench-end-to-end.ts [--precision=1e-6] [--scenarios=a.json,b.json] [--skip-readout]`, not a test): the
 * simulator's whole-job speed-up, measured in one process against its own reference path (SimulationOptions
 * `compile: false, fuse: false`: flat gates streamed and resolved one by one, nothing fused, one thread, no idle work
 * qubit left out; native kernels on in both):
 *  1. `check`'s rows (model blocks, fast-inverse and direct-shift rows, QSVT inverse rows) on every scenario in
 *     circuits/, with the verdicts of both paths (no work limit; the reference path keeps idle work qubits in the
 *     state, so rows that then exceed the simulator's qubit limit are skipped there and counted, which flatters it);
 *  2. the readout of G_00(z) of the Hubbard dimer (circuits/hubbard-dimer.json) in exact-expectation mode, both routes,
 *     at z = 0.5 + 1i (the estimate benchmark's point), with |G − G_reference path|.
 * Each run builds its own encodings (phases, grids) as the commands do, so the ratio is that of the whole job; the
 * compiled path splits large states over two threads (createSimulatorPool(2)).
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { groundLevel } from '../src/exact/groundLevel.js';
import { loadModelFile } from '../src/model/loadModelFile.js';
import type { FermionModel } from '../src/model/FermionModel.js';
import { estimateGreen } from '../src/readout/estimateGreen.js';
import { resolventEncoding } from '../src/resolvent/resolventEncoding.js';
import { createSimulatorPool } from '../src/sim/SimulatorPool.js';
import type { SimulationOptions } from '../src/sim/SimulationOptions.js';
import { checkModelBlocks } from '../src/verify/checkModelBlocks.js';
import { inversionCheckItems } from '../src/verify/inversionCheckItems.js';
import { resolventCheckRows } from '../src/verify/resolventCheckRows.js';
import type { CheckRow } from '../src/verify/encodingCheck.js';
import { solvedGround } from '../src/cli/readout/solvedGround.js';

const argument = (name: string): string | undefined => process.argv.find((a) => a.startsWith(`--${name}=`))?.slice(name.length + 3);
const precision = Number(argument('precision') ?? '1e-6');
const skipReadout = process.argv.includes('--skip-readout');
const only = argument('scenarios')?.split(',');

const pool = createSimulatorPool(2);
const compiled: SimulationOptions = { pool };
const reference: SimulationOptions = { compile: false, fuse: false };

function timed<T>(work: () => T): { value: T; seconds: number } {
  const start = process.hrtime.bigint();
  const value = work();
  return { value, seconds: Number(process.hrtime.bigint() - start) / 1e9 };
}

/** The rows `polewright check` makes (default z: grid midpoint + iη), simulated with `simulation`. */
function checkRows(model: FermionModel, simulation: SimulationOptions): CheckRow[] {
  const z = { re: (model.grid.from + model.grid.to) / 2, im: model.broadening };
  const E0 = groundLevel(model).energy;
  const extra = inversionCheckItems(model, { E0, z, fastInverse: { precision } });
  const limits = { tolerance: 1e-10, precision, maxSimulationWork: Infinity, simulation };
  return [...checkModelBlocks(model, { ...limits, extra }), ...resolventCheckRows(model, { E0, z }, limits)];
}

/** Rows the compiled path checked that the reference path skipped, and rows whose verdicts otherwise differ. */
function comparison(fast: readonly CheckRow[], slow: readonly CheckRow[]): string {
  const skipped = fast.filter((r, k) => r.verdict !== 'skipped' && slow[k]!.verdict === 'skipped').length;
  const differ = fast.filter((r, k) => r.verdict !== slow[k]!.verdict && slow[k]!.verdict !== 'skipped').length;
  return `${skipped} | ${differ}`;
}

const lines = [
  `check rows, precision ${precision} (time in s; the compiled path first, then the reference path, same process)`,
  '| scenario | rows | compiled | reference | speed-up | rows only the compiled path simulates | other verdict differences |',
  '|---|---|---|---|---|---|---|',
];
const folder = fileURLToPath(new URL('../circuits/', import.meta.url));
for (const file of readdirSync(folder).filter((f) => f.endsWith('.json') && (only === undefined || only.includes(f))).sort()) {
  const model = loadModelFile(folder + file);
  const fast = timed(() => checkRows(model, compiled));
  const slow = timed(() => checkRows(model, reference));
  lines.push(`| ${file} | ${fast.value.length} | ${fast.seconds.toFixed(2)} | ${slow.seconds.toFixed(2)} | ${(slow.seconds / fast.seconds).toFixed(1)}× | ${comparison(fast.value, slow.value)} |`);
  process.stderr.write(`${lines.at(-1)}\n`);
}

if (!skipReadout) {
  lines.push('', `readout of G_00(0.5 + 1i), Hubbard dimer, exact-expectation mode, resolvent precision ${precision}`);
  lines.push('| route | compiled | reference | speed-up | |G − G_reference| |', '|---|---|---|---|---|');
  const model = loadModelFile(fileURLToPath(new URL('../circuits/hubbard-dimer.json', import.meta.url)));
  const ground = solvedGround(model);
  for (const route of ['preconditioned', 'direct'] as const) {
    const estimate = (simulation: SimulationOptions) =>
      estimateGreen({
        modes: model.modes, electrons: model.electrons, groundEnergy: ground.energy, states: ground.states, pair: [0, 0], z: { re: 0.5, im: 1 },
        resolvent: (w) => resolventEncoding(model, w, { route, precision }), simulation,
      });
    const fast = timed(() => estimate(compiled));
    const slow = timed(() => estimate(reference));
    const gap = Math.hypot(fast.value.value.re - slow.value.value.re, fast.value.value.im - slow.value.value.im);
    lines.push(`| ${route} | ${fast.seconds.toFixed(2)} s | ${slow.seconds.toFixed(2)} s | ${(slow.seconds / fast.seconds).toFixed(1)}× | ${gap.toExponential(1)} |`);
    process.stderr.write(`${lines.at(-1)}\n`);
  }
}
await pool.close();
process.stdout.write(`${lines.join('\n')}\n`);
