/**
 * bench-sim (`npx tsx scripts/bench-sim.ts [--quick]`, not a test): prints
 *  1. seconds per 1-qubit, controlled and diagonal gate at 20/22/24 qubits vs a copy of both arrays;
 *  2. µs per gate of a 100,000-gate program of nested blocks at 10, 14 and 18 qubits: the streamed path (lazy
 *     flatten, one gate resolved at a time) vs the compiled program (compile once, then replay), same run;
 *  3. a QSVT-like workload: a fast inverse on 4 modes with an electron window called 1,000 times alternately with
 *     its inverse (an rz on the flag between calls): all gates vs sub-block kernels vs the fast-inverse kernel vs
 *     the kernel with idle work qubits left out of the state (time and state qubits).
 */
import { defineBlock } from '../src/circuit/defineBlock.js';
import { CircuitBuilder } from '../src/circuit/CircuitBuilder.js';
import { call, gate } from '../src/circuit/ops.js';
import type { Block, Circuit, UnitaryOp } from '../src/circuit/types.js';
import { fastInverse } from '../src/inversion/fastInverse.js';
import { StateVector } from '../src/sim/StateVector.js';
import { applyCircuit } from '../src/sim/applyCircuit.js';
import { applyUnitaryOps } from '../src/sim/applyUnitaryOps.js';
import { applyUnitaryStream } from '../src/sim/internal/applyFlatOps.js';
import { flattenForSimulation } from '../src/sim/internal/flattenForSimulation.js';
import { prepareBlockOnZeroAncillas } from '../src/sim/simulateBlockOnZeroAncillas.js';

const quick = process.argv.includes('--quick');

function seconds(work: () => void): number {
  const start = process.hrtime.bigint();
  work();
  return Number(process.hrtime.bigint() - start) / 1e9;
}

/** Best-of-`reps` seconds of `work` and of `copy`, timed alternately after two warm-up runs. */
function bestOf(reps: number, work: () => void, copy: () => void): [number, number] {
  work();
  work();
  let bestWork = Infinity;
  let bestCopy = Infinity;
  for (let r = 0; r < reps; r++) {
    bestCopy = Math.min(bestCopy, seconds(copy));
    bestWork = Math.min(bestWork, seconds(work));
  }
  return [bestWork, bestCopy];
}

function gateKernels(): void {
  for (const n of quick ? [20] : [20, 22, 24]) {
    const state = StateVector.zero(n);
    state.re.fill(1 / Math.sqrt(2 ** n));
    const copyRe = new Float64Array(2 ** n);
    const copyIm = new Float64Array(2 ** n);
    const copy = (): void => {
      copyRe.set(state.re);
      copyIm.set(state.im);
    };
    const reps = Math.max(10, 2 ** (26 - n));
    const mid = n >> 1;
    const cases: [string, UnitaryOp][] = [
      [`h q[${mid}] (1-qubit)`, gate('h', [mid])],
      ['h q[0] (1-qubit)', gate('h', [0])],
      [`h q[${n - 1}] (1-qubit)`, gate('h', [n - 1])],
      [`crx q[0], q[${mid}] (controlled)`, gate('crx', [0, mid], [0.3])],
      [`ctrl(2) @ x q[${mid - 1}], q[${mid + 1}], q[${mid}]`, gate('x', [mid], [], { controls: [mid - 1, mid + 1] })],
      [`rz(0.3) q[${mid}] (diagonal)`, gate('rz', [mid], [0.3])],
      [`p(0.3) q[${mid}] (diagonal, phase)`, gate('p', [mid], [0.3])],
    ];
    console.log(`${n} qubits, best of ${reps}`);
    for (const [label, op] of cases) {
      const [gateTime, copyTime] = bestOf(reps, () => applyUnitaryOps(state, [op]), copy);
      console.log(`  ${label.padEnd(36)} ${gateTime.toExponential(3)} s   copy ${copyTime.toExponential(3)} s   ratio ${(gateTime / copyTime).toFixed(2)}`);
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

function compiledVersusStreamed(): void {
  console.log('\n100,000-gate program of nested blocks: µs per gate');
  for (const n of [10, 14, 18]) {
    const calls = quick && n === 18 ? 10 : 100;
    const gates = calls * 1000;
    const circuit = nestedProgram(n, calls);
    const streamedState = StateVector.zero(n);
    const streamed = seconds(() => applyUnitaryStream(streamedState, flattenForSimulation(circuit, {}), 'bench'));
    const compiledState = StateVector.zero(n);
    const first = seconds(() => applyCircuit(compiledState, circuit));
    const replay = seconds(() => applyCircuit(compiledState, circuit));
    const us = (s: number): string => ((1e6 * s) / gates).toFixed(3).padStart(8);
    console.log(`  ${n} qubits, ${gates} gates: streamed ${us(streamed)}   compiled first run (with compile) ${us(first)}   replay ${us(replay)}   ratio streamed/replay ${(streamed / replay).toFixed(2)}`);
  }
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
  const run = (label: string, block: Block, count: number, options: { useNativeKernels?: boolean }, elide: boolean): void => {
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
}

gateKernels();
compiledVersusStreamed();
qsvtLike();
