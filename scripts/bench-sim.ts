/**
 * bench-sim (`npx tsx scripts/bench-sim.ts [--quick] [--sizes=10,24] [--30]`, not a test): prints, in one process,
 *  1. for 10, 20, 22, 24 and 26 qubits: a streaming copy of the state (both arrays: the bandwidth reference), then a
 *     1-qubit gate on a low and a high qubit, a controlled gate, a diagonal gate, a fused block of 10 gates on 4
 *     qubits and a seeded 200-gate random circuit, each as a ratio to the copy (best of several runs), with µs per
 *     gate at 10 qubits; the random circuit also with a SimulatorPool of two threads (speed-up over one);
 *  2. a 100,000-gate program of nested blocks at 10 qubits (as `applyCircuit` reads it: compiled, fused) against a
 *     hand-written loop applying the same gates one by one with pre-resolved kernels, and the streamed path, same run;
 *  3. a QSVT-like workload: a fast inverse on 4 modes with an electron window called 1,000 times alternately with
 *     its inverse (an rz on the flag between calls): all gates vs sub-block kernels vs the fast-inverse kernel vs
 *     the kernel with idle work qubits left out of the state (time and state qubits);
 *  4. with --30 only: one 1-qubit gate on a 30-qubit state (16 GiB) against copying re into im and back.
 */
import { defineBlock } from '../src/circuit/defineBlock.js';
import { CircuitBuilder } from '../src/circuit/CircuitBuilder.js';
import { flatten } from '../src/circuit/flatten.js';
import { call, gate } from '../src/circuit/ops.js';
import { resolveGate } from '../src/circuit/resolveGate.js';
import type { Block, Circuit, UnitaryOp } from '../src/circuit/types.js';
import { seededRandom } from '../src/core/seededRandom.js';
import { fastInverse } from '../src/inversion/fastInverse.js';
import { createSimulatorPool, type SimulatorPool } from '../src/sim/SimulatorPool.js';
import { StateVector } from '../src/sim/StateVector.js';
import { applyCircuit } from '../src/sim/applyCircuit.js';
import { applyUnitaryStream } from '../src/sim/internal/applyFlatOps.js';
import { applyStep, stepWork } from '../src/sim/internal/applyStep.js';
import { flattenForSimulation } from '../src/sim/internal/flattenForSimulation.js';
import { gateStep } from '../src/sim/internal/gateStep.js';
import type { Step } from '../src/sim/internal/Program.js';
import type { SimulationOptions } from '../src/sim/SimulationOptions.js';
import { prepareBlockOnZeroAncillas } from '../src/sim/simulateBlockOnZeroAncillas.js';

const quick = process.argv.includes('--quick');

function seconds(work: () => void): number {
  const start = process.hrtime.bigint();
  work();
  return Number(process.hrtime.bigint() - start) / 1e9;
}

/** Best-of-`reps` seconds of `work`, after one warm-up run unless `warm` is false. */
function best(reps: number, work: () => void, warm = true): number {
  if (warm) work();
  let time = Infinity;
  for (let r = 0; r < reps; r++) time = Math.min(time, seconds(work));
  return time;
}

/** Best-of-`reps` seconds of `work` and of `reference`, timed alternately (after one warm-up of `work` when `warm`). */
function bestAlternating(reps: number, work: () => void, reference: () => void, warm = true): [number, number] {
  if (warm) work();
  let bestWork = Infinity;
  let bestReference = Infinity;
  for (let r = 0; r < reps; r++) {
    bestReference = Math.min(bestReference, seconds(reference));
    bestWork = Math.min(bestWork, seconds(work));
  }
  return [bestWork, bestReference];
}

function circuitOf(n: number, ops: readonly UnitaryOp[]): Circuit {
  const builder = new CircuitBuilder();
  builder.qubits('q', n);
  return builder.add(...ops).build();
}

/** A seeded random circuit: 1-qubit rotations and Hadamards, CNOTs, controlled phases, on any qubits. */
function randomCircuit(n: number, gates: number, seed: number): Circuit {
  const random = seededRandom(seed);
  const qubit = (): number => Math.floor(random.next() * n);
  const ops: UnitaryOp[] = [];
  while (ops.length < gates) {
    const a = qubit();
    const b = qubit();
    const kind = Math.floor(random.next() * 5);
    if (kind === 0) ops.push(gate('h', [a]));
    else if (kind === 1) ops.push(gate('ry', [a], [random.next() * 3]));
    else if (kind === 2) ops.push(gate('rz', [a], [random.next() * 3]));
    else if (a !== b) ops.push(gate(kind === 3 ? 'cx' : 'cp', [a, b], kind === 3 ? [] : [random.next()]));
  }
  return circuitOf(n, ops);
}

/** Ten gates on qubits q … q+3 (rotations, CNOTs, a controlled phase): one dense 4-qubit pass when fused. */
function fourQubitBlock(q: number): UnitaryOp[] {
  return [
    gate('h', [q]), gate('cx', [q, q + 1]), gate('ry', [q + 2], [0.4]), gate('cx', [q + 2, q + 3]), gate('rx', [q + 1], [0.3]),
    gate('cp', [q + 3, q], [0.2]), gate('h', [q + 3]), gate('cx', [q + 1, q + 2]), gate('rz', [q], [0.7]), gate('ry', [q + 3], [1.1]),
  ];
}

interface Row {
  readonly label: string;
  readonly circuit: Circuit;
  readonly gates: number;
  readonly options?: SimulationOptions;
}

function gateKernels(pool: SimulatorPool): void {
  console.log('Gate passes against a streaming copy of the state (best of several runs; ratio = time / copy time)');
  const sizesArgument = process.argv.find((a) => a.startsWith('--sizes='));
  const sizes = sizesArgument ? sizesArgument.slice('--sizes='.length).split(',').map(Number).filter((n) => n > 0) : quick ? [10, 20] : [10, 20, 22, 24, 26];
  for (const n of sizes) {
    const state = StateVector.zero(n);
    state.re.fill(1 / Math.sqrt(2 ** n));
    const copyRe = new Float64Array(2 ** n);
    const copyIm = new Float64Array(2 ** n);
    const reps = n === 10 ? 2000 : Math.max(3, 2 ** (24 - n) * 4);
    const copyState = (): void => {
      copyRe.set(state.re);
      copyIm.set(state.im);
    };
    const copy = best(reps, copyState);
    const mid = n >> 1;
    const random = randomCircuit(n, 200, 7);
    const rows: Row[] = [
      { label: 'h q[0] (1-qubit, low)', circuit: circuitOf(n, [gate('h', [0])]), gates: 1 },
      { label: `h q[${n - 1}] (1-qubit, high)`, circuit: circuitOf(n, [gate('h', [n - 1])]), gates: 1 },
      { label: `crx q[${n - 1}], q[${mid}] (controlled)`, circuit: circuitOf(n, [gate('crx', [n - 1, mid], [0.3])]), gates: 1 },
      { label: `rz q[${mid}] (diagonal)`, circuit: circuitOf(n, [gate('rz', [mid], [0.3])]), gates: 1 },
      { label: `10 gates on q[${mid - 2}..${mid + 1}], fused`, circuit: circuitOf(n, fourQubitBlock(mid - 2)), gates: 10 },
      { label: '  the same 10 gates unfused', circuit: circuitOf(n, fourQubitBlock(mid - 2)), gates: 10, options: { fuse: false } },
      { label: '200-gate random circuit, 1 thread', circuit: random, gates: 200 },
      { label: '200-gate random circuit, 2 threads', circuit: random, gates: 200, options: { pool } },
    ];
    console.log(`${n} qubits: copy ${(copy * 1e3).toFixed(3)} ms (best of ${reps}; each ratio uses the best copy of its own runs too)`);
    let oneThread = 0;
    for (const row of rows) {
      const options = row.options ?? {};
      const heavy = row.gates > 10;
      // Big circuits on big states: two runs, no warm-up (the kernels are warm from the smaller sizes).
      const cpuBefore = process.cpuUsage();
      const wallBefore = process.hrtime.bigint();
      const rowReps = heavy && n >= 24 ? 2 : heavy ? Math.max(2, Math.ceil(reps / 50)) : reps;
      // The machine is shared: the copy is timed again alternately with the row, and each ratio uses both bests.
      const [time, rowCopy] = bestAlternating(rowReps, () => applyCircuit(state, row.circuit, options), copyState, !(heavy && n >= 24));
      const copyNow = Math.min(rowCopy, copy);
      const cpu = process.cpuUsage(cpuBefore);
      // CPU seconds per wall second over the row (all threads): about 2 when the machine gave both cores.
      const cores = (cpu.user + cpu.system) / 1e3 / (Number(process.hrtime.bigint() - wallBefore) / 1e6);
      if (row.label.endsWith('1 thread')) oneThread = time;
      const perGate = n === 10 ? `   ${((1e6 * time) / row.gates).toFixed(3).padStart(7)} µs per gate` : '';
      const speedUp = row.options?.pool ? `   speed-up ${(oneThread / time).toFixed(2)}× over 1 thread (CPU/wall ${cores.toFixed(2)})` : '';
      console.log(`  ${row.label.padEnd(40)} ${(time * 1e3).toFixed(3).padStart(10)} ms   ratio ${(time / copyNow).toFixed(2).padStart(7)}${perGate}${speedUp}`);
    }
  }
}

/** 100 calls of a 10-call block of a 10-call block of a 10-gate layer (with controls and inverses): 100,000 gates. */
function nestedProgram(n: number, calls: number): Circuit {
  const layer = defineBlock({ name: 'layer', role: 'bench', qubits: 4, params: ['t'] }, [
    gate('h', [0]), gate('rx', [1], [0.3]), gate('cx', [0, 2]), gate('crz', [3, 1], [{ op: 'param', index: 0 }]),
    gate('ccx', [0, 1, 3]), gate('t', [2]), gate('ry', [3], [0.7]), gate('swap', [1, 2]), gate('cp', [2, 0], [0.2]),
    gate('u3', [3], [0.1, 0.2, 0.3]),
  ]);
  const place = (k: number): number[] => [k % n, (k + 3) % n, (k + 5) % n, (k + 8) % n];
  const middle = defineBlock({ name: 'middle', role: 'bench', qubits: n },
    Array.from({ length: 10 }, (_, k) => call(layer, place(k), [0.1 * k], { inverse: k % 3 === 0 })));
  const outer = defineBlock({ name: 'outer', role: 'bench', qubits: n },
    Array.from({ length: 10 }, (_, k) => call(middle, Array.from({ length: n }, (_, q) => (q + k) % n), [], k % 4 === 0 ? {} : { inverse: k % 2 === 0 })));
  const builder = new CircuitBuilder();
  builder.qubits('q', n);
  for (let k = 0; k < calls; k++) builder.add(call(outer, Array.from({ length: n }, (_, q) => (q + 2 * k) % n)));
  return builder.build();
}

/** The flat gates of `circuit` as unfused kernel steps, each resolved once (the hand-written loop's input). */
function flatSteps(circuit: Circuit, n: number): Step[] {
  const steps: Step[] = [];
  for (const op of flatten(circuit)) {
    if (op.kind !== 'gate') continue;
    const step = gateStep(resolveGate(op), n);
    if (step) steps.push(step);
  }
  return steps;
}

function compiledVersusHandWritten(): void {
  const n = 10;
  const calls = 100;
  const gates = calls * 1000;
  const circuit = nestedProgram(n, calls);
  const steps = flatSteps(circuit, n);
  const state = StateVector.zero(n);
  const { re, im } = state;
  const handWritten = (): void => {
    for (const step of steps) applyStep(step, re, im, 0, stepWork(step, re.length));
  };
  const first = seconds(() => applyCircuit(StateVector.zero(n), circuit));
  const reps = quick ? 3 : 10;
  const compiled = best(reps, () => applyCircuit(state, circuit));
  const loop = best(reps, handWritten);
  const streamed = best(2, () => applyUnitaryStream(state, flattenForSimulation(circuit, {}), 'bench'));
  const us = (s: number): string => ((1e6 * s) / gates).toFixed(3).padStart(7);
  console.log(`\n${gates}-gate program of nested blocks at ${n} qubits, µs per gate (best of ${reps}):`);
  console.log(`  applyCircuit (compiled, fused) ${us(compiled)}   hand-written loop over pre-resolved gates ${us(loop)}   ` +
    `streamed ${us(streamed)}   first run with compile ${us(first)}   loop / compiled ${(loop / compiled).toFixed(2)}×`);
}

function thirtyQubits(): void {
  const n = 30;
  const state = StateVector.zero(n);
  const gateTime = seconds(() => applyCircuit(state, circuitOf(n, [gate('h', [15])])));
  const copy = seconds(() => {
    state.im.set(state.re);
    state.re.set(state.im);
  });
  console.log(`\n30 qubits (16 GiB): h q[15] ${gateTime.toFixed(2)} s, copy re → im → re ${copy.toFixed(2)} s, ratio ${(gateTime / copy).toFixed(2)} (one run each)`);
}

function qsvtLike(): void {
  const n = 4;
  const entries = [0.5, 0.12, -0.2, 0.05, 0.12, -0.3, 0.1, 0.02, -0.2, 0.1, 0.8, -0.15, 0.05, 0.02, -0.15, 0.1];
  const T = { n, re: Float64Array.from(entries), im: new Float64Array(n * n) };
  const encoding = fastInverse(T, { re: 0.2, im: 0.3 }, { electrons: [1, 3], maxBits: 6, precision: 0.05 });
  const U = encoding.block;
  const withoutKernel: Block = { ...U, nativeKernel: undefined } as Block;
  const calls = 1000;
  const sequence = (block: Block, count: number): Block => {
    const all = Array.from({ length: block.qubits }, (_, k) => k);
    const ops: UnitaryOp[] = [];
    for (let k = 0; k < count; k++) ops.push(call(block, all, [], { inverse: k % 2 === 1 }), gate('rz', [n], [0.01 * (k + 1)]));
    return defineBlock({ name: 'qsvt_like', role: 'bench', qubits: block.qubits }, ops);
  };
  console.log(`\nQSVT-like: fast inverse on ${n} modes with window (m = ${encoding.registerBits}, ${U.qubits} qubits), ${calls} calls alternating with its inverse`);
  const idleZero = Array.from({ length: U.qubits - n }, (_, k) => n + k);
  const run = (label: string, block: Block, count: number, options: { useNativeKernels?: boolean; fuse?: boolean }, elide: boolean): void => {
    const program = sequence(block, count);
    const prepared = prepareBlockOnZeroAncillas(program, { ...options, idleZero: elide ? idleZero : [] });
    const input = new Float64Array(2 ** prepared.inputQubits.length);
    input[1] = 1;
    const first = seconds(() => prepared.run(input, new Float64Array(input.length)));
    const replay = seconds(() => prepared.run(input, new Float64Array(input.length)));
    const perCall = replay / count;
    console.log(`  ${label.padEnd(44)} state ${String(prepared.stateQubits).padStart(2)} qubits   ${(perCall * 1e3).toFixed(3).padStart(9)} ms per call   ` +
      `${(perCall * calls).toFixed(2).padStart(8)} s per ${calls} calls${count < calls ? ` (measured on ${count})` : ''}   first run ${first.toFixed(2)} s`);
  };
  run('all gates (no native kernels)', U, quick ? 4 : 20, { useNativeKernels: false }, false);
  run('sub-block kernels (adders, multiplexors)', withoutKernel, quick ? 20 : 100, {}, false);
  run('fast-inverse kernel, full state', U, calls, {}, false);
  run('fast-inverse kernel, idle work qubits elided', U, calls, {}, true);
  run('  the same, unfused', U, calls, { fuse: false }, true);
  run('fast-inverse kernel, full state, unfused', U, calls, { fuse: false }, false);
}

if (process.argv.includes('--30')) thirtyQubits();
else {
  const pool = createSimulatorPool(2);
  try {
    gateKernels(pool);
  } finally {
    await pool.close();
  }
  compiledVersusHandWritten();
  qsvtLike();
}
