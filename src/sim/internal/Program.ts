/**
 * Program: a compiled, replayable list of simulator steps on the bits of a state of fixed size —
 * gate kernels with their matrices and index patterns already resolved, prepared native-kernel
 * passes, repeats of shared sub-programs (block bodies compiled once, called many times), and fused
 * steps (a dense matrix or a diagonal on a few target bits, applied in one pass; see fuseSteps.ts).
 */
import type { Matrix2 } from '../../circuit/standardGates.js';
import type { StateVector } from '../StateVector.js';
import type { IndexPattern } from './indexPattern.js';

/** Multiply the pattern's amplitudes by numbers[0] + i·numbers[1]. */
export const SCALE = 0;
/** General 2×2 matrix on target bit `stride`, no controls (plain pair loop). */
export const STRIDE = 1;
/** diag(a, d) over the pattern's pairs (i, i + stride). */
export const DIAGONAL = 2;
/** [[0, b], [c, 0]] over the pattern's pairs. */
export const ANTI_DIAGONAL = 3;
/** General 2×2 matrix over the pattern's pairs. */
export const MATRIX = 4;
/** Powered swap of bits `stride` and `other` with phase numbers[0] + i·numbers[1]. */
export const SWAP = 5;
/** A prepared native-kernel pass. */
export const NATIVE = 6;
/** `program` run `times` times. */
export const REPEAT = 7;
/** Dense 2^t × 2^t matrix `dense` on bits `targets`, over the pattern (controls at their values, targets 0). */
export const DENSE = 8;
/** Diagonal `dense` (2^t complex entries) on bits `targets`, over the pattern (controls at their values, targets free). */
export const DIAGONAL_TABLE = 9;
/** The kernel steps of `program` (all on bits below log2 `stride`) applied tile by tile: blocks of `stride` amplitudes. */
export const TILE = 10;

/** One step; every step has all fields (one object shape keeps the replay loop monomorphic). */
export interface Step {
  readonly code: number;
  readonly pattern: IndexPattern | null;
  readonly stride: number;
  readonly other: number;
  /** A Matrix2, or the leading numbers of a factor or swap phase. */
  readonly numbers: Matrix2;
  /** State bits the step's matrix acts on, ascending (controls excluded; none for a phase). */
  readonly targets: Int32Array;
  /** DENSE: row-major interleaved (re, im) 2^t × 2^t matrix; DIAGONAL_TABLE: its 2^t diagonal entries. */
  readonly dense: Float64Array;
  /** DENSE: the state offset of each local target index (local bit k = targets[k]); DIAGONAL_TABLE: diagonalLowLookup(targets). */
  readonly offsets: Int32Array;
  readonly pass: ((state: StateVector) => void) | null;
  readonly program: Program | null;
  readonly times: number;
}

export interface Program {
  readonly steps: readonly Step[];
  /** Number of state qubits the program was compiled for. */
  readonly stateQubits: number;
  /** Primitive operations one replay applies (gates and native passes, repeats multiplied out). */
  readonly operations: number;
}

const NO_NUMBERS: Matrix2 = [0, 0, 0, 0, 0, 0, 0, 0];
const NO_BITS = new Int32Array(0);
const NO_ENTRIES = new Float64Array(0);

export function makeStep(fields: Partial<Step> & { readonly code: number }): Step {
  return {
    code: fields.code,
    pattern: fields.pattern ?? null,
    stride: fields.stride ?? 0,
    other: fields.other ?? 0,
    numbers: fields.numbers ?? NO_NUMBERS,
    targets: fields.targets ?? NO_BITS,
    dense: fields.dense ?? NO_ENTRIES,
    offsets: fields.offsets ?? NO_BITS,
    pass: fields.pass ?? null,
    program: fields.program ?? null,
    times: fields.times ?? 1,
  };
}

export function makeProgram(steps: readonly Step[], stateQubits: number): Program {
  let operations = 0;
  for (const step of steps) operations += step.program ? step.times * step.program.operations : 1;
  return { steps, stateQubits, operations };
}
