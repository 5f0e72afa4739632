/**
 * simulateBlockOnZeroAncillas: simulates one block on inputs whose chosen ("idle") qubits are |0>,
 * leaving out of the state every idle qubit that only native kernels use as a work qubit (such a
 * qubit is |0> again at the end, so the output is the reduced state ⊗ |0>). The block is compiled
 * once; `run` and `runBasis` replay it for as many inputs as the caller needs (columns, probes). With
 * `compile: false` (the benchmarks' reference path) nothing is left out and every run streams the flat gates.
 */
import { call } from '../circuit/ops.js';
import type { Block, Circuit } from '../circuit/types.js';
import { InputError } from '../core/InputError.js';
import { ensureFits } from '../core/memoryBudget.js';
import type { SimulationOptions } from './SimulationOptions.js';
import { MAX_QUBITS, StateVector, stateVectorBytes } from './StateVector.js';
import { applyUnitaryStream } from './internal/applyFlatOps.js';
import { compileCall, compileTarget } from './internal/compileProgram.js';
import { flattenForSimulation } from './internal/flattenForSimulation.js';
import { kernelLookup } from './internal/kernelLookup.js';
import { makeProgram, type Program, type Step } from './internal/Program.js';
import { runProgram } from './internal/runProgram.js';
import { touchedQubits } from './internal/touchedQubits.js';

export interface ZeroAncillaOptions extends SimulationOptions {
  /** Local qubits of the block that start in |0> (e.g. every ancilla of a block-encoding). */
  readonly idleZero: readonly number[];
  /** Evaluated angle arguments of the call (default none). */
  readonly args?: readonly number[];
  /** Simulate the block's inverse (default false). */
  readonly inverse?: boolean;
}

export interface BlockOnZeroAncillas {
  /** Local qubits held in the state, ascending: state bit k is local qubit kept[k]. */
  readonly kept: readonly number[];
  /** Idle local qubits left out of the state (|0> at the start and, by their blocks' guarantee, at the end). */
  readonly elided: readonly number[];
  /** Local qubits that are not idle, ascending: input index bit k is local qubit inputQubits[k]. */
  readonly inputQubits: readonly number[];
  /** Number of qubits of the simulated state (kept.length). */
  readonly stateQubits: number;
  /** Primitive operations one run applies (gates and native passes, repeats multiplied out). */
  readonly operations: number;
  /** The output for the input Σ_u amplitude_u |u>_input ⊗ |0>_idle (2^inputQubits.length amplitudes). */
  run(inputRe: ArrayLike<number>, inputIm: ArrayLike<number>): StateVector;
  /** The output for the basis input |index>_input ⊗ |0>_idle. */
  runBasis(index: number): StateVector;
  /** The state index of a block-local basis index, or −1 when it sets an elided qubit (amplitude 0). */
  stateIndex(localIndex: number): number;
}

/**
 * Compiles `block` for inputs with options.idleZero in |0>. Throws RangeError for idle qubits out of
 * range or repeated, InputError when the reduced state does not fit in memory.
 */
export function prepareBlockOnZeroAncillas(block: Block, options: ZeroAncillaOptions): BlockOnZeroAncillas {
  const idle = new Set(options.idleZero);
  if (idle.size !== options.idleZero.length || options.idleZero.some((q) => !Number.isInteger(q) || q < 0 || q >= block.qubits)) {
    throw new RangeError(`prepareBlockOnZeroAncillas: idle qubits ${JSON.stringify(options.idleZero)} are not distinct qubits of ${block.name}`);
  }
  const compiled = options.compile !== false;
  const locals = Array.from({ length: block.qubits }, (_, q) => q);
  const touched = compiled ? touchedQubits(block, kernelLookup(options)) : new Set(locals);
  const elided = locals.filter((q) => idle.has(q) && !touched.has(q));
  const kept = locals.filter((q) => !elided.includes(q));
  const inputQubits = locals.filter((q) => !idle.has(q));
  const bits = new Array<number>(block.qubits).fill(-1);
  kept.forEach((q, k) => (bits[q] = k));
  const stateQubits = kept.length;
  // Refuse an oversized state before compiling (patterns and tables are built for the state size).
  if (stateQubits > MAX_QUBITS) throw new InputError(`prepareBlockOnZeroAncillas: ${stateQubits} state qubits exceed the simulator's maximum of ${MAX_QUBITS}`);
  ensureFits(stateVectorBytes(stateQubits), `a ${stateQubits}-qubit state vector`, options.memoryLimitBytes);
  const args = options.args ?? [];
  const inverse = options.inverse ?? false;
  let apply: (state: StateVector) => void;
  let operations: number;
  if (compiled) {
    const steps: Step[] = [];
    compileCall(block, args, { bits, controls: [], negControls: [], inverse, times: 1 }, compileTarget(stateQubits, options), steps);
    const program: Program = makeProgram(steps, stateQubits);
    apply = (state) => runProgram(program, state, options.pool);
    operations = program.operations;
  } else {
    const circuit: Circuit = { qubitRegisters: [{ name: 'q', size: block.qubits, offset: 0 }], bitRegisters: [], ops: [call(block, locals, args, { inverse })] };
    apply = (state) => applyUnitaryStream(state, flattenForSimulation(circuit, options), 'prepareBlockOnZeroAncillas', options);
    operations = 0;
    for (const _ of flattenForSimulation(circuit, options)) operations++;
  }
  const inputPlace = Int32Array.from({ length: 2 ** inputQubits.length }, (_, u) => {
    let index = 0;
    inputQubits.forEach((q, k) => (index |= ((u >>> k) & 1) << bits[q]!));
    return index;
  });
  const memoryLimitBytes = options.memoryLimitBytes;
  const sizeOptions = memoryLimitBytes === undefined ? {} : { memoryLimitBytes };
  const stateIndex = (localIndex: number): number => {
    let index = 0;
    for (let q = 0; q < block.qubits; q++) {
      if (((localIndex >>> q) & 1) === 0) continue;
      if (bits[q]! < 0) return -1;
      index |= 1 << bits[q]!;
    }
    return index;
  };
  return {
    kept,
    elided,
    inputQubits,
    stateQubits,
    operations,
    run(inputRe, inputIm) {
      if (inputRe.length !== inputPlace.length || inputIm.length !== inputPlace.length) {
        throw new RangeError(`BlockOnZeroAncillas.run: expected ${inputPlace.length} input amplitudes`);
      }
      const state = StateVector.zero(stateQubits, sizeOptions);
      state.re[0] = 0;
      for (let u = 0; u < inputPlace.length; u++) {
        state.re[inputPlace[u]!] = inputRe[u]!;
        state.im[inputPlace[u]!] = inputIm[u]!;
      }
      apply(state);
      return state;
    },
    runBasis(index) {
      if (!Number.isInteger(index) || index < 0 || index >= inputPlace.length) throw new RangeError(`BlockOnZeroAncillas.runBasis: index ${index} out of range`);
      const state = StateVector.basis(stateQubits, inputPlace[index]!, sizeOptions);
      apply(state);
      return state;
    },
    stateIndex,
  };
}

/**
 * One run of `block` on |input> ⊗ |0>_idle (input over the non-idle qubits, ascending): the reduced
 * output state and how to find a local basis index in it. See prepareBlockOnZeroAncillas.
 */
export function simulateBlockOnZeroAncillas(
  block: Block,
  input: { readonly re: ArrayLike<number>; readonly im: ArrayLike<number> },
  options: ZeroAncillaOptions,
): { readonly state: StateVector; readonly prepared: BlockOnZeroAncillas } {
  const prepared = prepareBlockOnZeroAncillas(block, options);
  return { state: prepared.run(input.re, input.im), prepared };
}
