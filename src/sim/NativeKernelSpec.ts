/**
 * NativeKernelSpec: a native block kernel in its compiled form — prepared once per call site (block,
 * arguments, qubits, modifiers) into a pass the simulator replays — and the table type that maps
 * kernel ids to kernels (plain NativeKernel functions or specs) in the simulation options.
 */
import type { Block, UnitaryOp } from '../circuit/types.js';
import type { StateVector } from './StateVector.js';
import type { NativeKernel } from './registerNativeKernel.js';

/** One call of a block, as a prepared kernel sees it; qubit numbers are bits of the simulated state. */
export interface NativeCall {
  readonly block: Block;
  /** Evaluated angle arguments of the call. */
  readonly args: readonly number[];
  /** State bit of each local qubit of the block; −1 for a work qubit left out of the state (known to be |0>). */
  readonly qubits: readonly number[];
  readonly controls: readonly number[];
  readonly negControls: readonly number[];
  readonly inverse: boolean;
  /** Repetitions, an integer ≥ 1. */
  readonly power: number;
  /** Number of qubits of the state the pass will be applied to. */
  readonly stateQubits: number;
  /**
   * Compiles `ops` of a block scope (local qubit q → bit bits[q] of a `stateQubits`-qubit state, −1 for
   * qubits the ops must not touch; parameters `params`) with the same kernel choice as this call, for
   * kernels that tabulate part of their block by simulating it.
   */
  readonly compileOps: (ops: readonly UnitaryOp[], bits: readonly number[], params: readonly number[], stateQubits: number) => (state: StateVector) => void;
}

export interface NativeKernelSpec {
  /** Prepares a call (all tables, angles and patterns) and returns the pass that applies it. */
  readonly prepare: (call: NativeCall) => (state: StateVector) => void;
  /** True when the pass accepts any of the block's `workQubits` absent (qubits[k] = −1). Default false. */
  readonly runsWithoutWorkQubits?: boolean;
  /**
   * Number of leading compute ops of a conjugated block that the simulator applies itself, before
   * the pass (and their inverse after it); the pass covers the rest of the block. Default 0.
   */
  readonly simulatedCompute?: (block: Block) => number;
}

/** Kernel ids → kernels; SimulationOptions.nativeKernels entries are consulted before the process-wide registry. */
export type NativeKernelTable = ReadonlyMap<string, NativeKernel | NativeKernelSpec>;
