/**
 * fuseSteps: merges runs of consecutive kernel steps into single passes — a run whose bits (targets
 * plus controls not shared by every step of the run) number at most MAX_DENSE_BITS becomes one 2×2
 * matrix pass (STRIDE, or MATRIX under shared controls) or one dense 4 × 4 pass (DENSE), a run of
 * diagonal steps on at most MAX_DIAGONAL_BITS bits one diagonal table (DIAGONAL_TABLE). Larger dense
 * matrices are not built: in JavaScript their products cost more than the passes they save (runs on
 * low bits are instead applied tile by tile, see tileSteps.ts). Controls shared by the whole run stay controls: the fused pass visits only
 * the indices where they hold. A run is fused only when a simple cost model (memory passes plus
 * arithmetic per amplitude) says one pass is cheaper than its steps. The matrix is composed by
 * applying the run's steps to basis columns in order, so the fused pass equals the run to rounding.
 * Native passes and repeats end a run; steps are never reordered.
 */
import { diagonalLowLookup } from '../kernels/applyDiagonalTable.js';
import { indexPattern } from './indexPattern.js';
import type { Matrix2 } from '../../circuit/standardGates.js';
import { ANTI_DIAGONAL, DENSE, DIAGONAL, DIAGONAL_TABLE, MATRIX, SCALE, STRIDE, SWAP, makeStep, type Step } from './Program.js';

/** Most bits of a fused dense matrix (4 × 4: an unrolled kernel). */
export const MAX_DENSE_BITS = 2;
/** Most bits of a fused diagonal (a table of 256 entries). */
export const MAX_DIAGONAL_BITS = 8;
/** States of at least this many qubits no longer fit in cache: a pass over memory costs more. */
const LARGE_STATE_QUBITS = 16;

const KERNEL_CODES = new Set([SCALE, STRIDE, DIAGONAL, ANTI_DIAGONAL, MATRIX, SWAP, DENSE, DIAGONAL_TABLE]);
const DIAGONAL_CODES = new Set([SCALE, DIAGONAL, DIAGONAL_TABLE]);

function bitCount(mask: number): number {
  let count = 0;
  for (let m = mask; m !== 0; m &= m - 1) count++;
  return count;
}

function bitsOf(mask: number): number[] {
  const bits: number[] = [];
  for (let b = 0; b < 31; b++) if ((mask >>> b) & 1) bits.push(b);
  return bits;
}

/** A kernel step seen by the fuser: target and control masks and its matrix on its targets. */
interface Piece {
  readonly step: Step;
  readonly targets: number;
  readonly controls: number;
  readonly controlValue: number;
  readonly diagonal: boolean;
}

function piece(step: Step): Piece {
  let targets = 0;
  for (const t of step.targets) targets |= 1 << t;
  let fixed = 0;
  if (step.pattern) for (const p of step.pattern.positions) fixed |= 1 << p;
  const controls = fixed & ~targets;
  return { step, targets, controls, controlValue: (step.pattern?.value ?? 0) & controls, diagonal: DIAGONAL_CODES.has(step.code) };
}

/** The step's matrix on its targets (local bit k = targets[k]), row-major interleaved (re, im). */
function targetMatrix(step: Step): Float64Array {
  const m = step.numbers;
  switch (step.code) {
    case SCALE:
      return Float64Array.of(m[0], m[1]);
    case SWAP: {
      const [er, ei] = [m[0], m[1]];
      const matrix = new Float64Array(32);
      const set = (r: number, c: number, re: number, im: number): void => {
        matrix[2 * (4 * r + c)] = re;
        matrix[2 * (4 * r + c) + 1] = im;
      };
      set(0, 0, 1, 0);
      set(3, 3, 1, 0);
      // Powered swap on span{|01>, |10>}: [[p, q], [q, p]], p = (1 + e)/2, q = (1 − e)/2 (as applySwapPairs).
      for (const [r, c] of [[1, 1], [2, 2]] as const) set(r, c, (1 + er) / 2, ei / 2);
      for (const [r, c] of [[1, 2], [2, 1]] as const) set(r, c, (1 - er) / 2, -ei / 2);
      return matrix;
    }
    case DENSE:
      return step.dense;
    case DIAGONAL_TABLE: {
      const dim = step.dense.length / 2;
      const matrix = new Float64Array(2 * dim * dim);
      for (let j = 0; j < dim; j++) {
        matrix[2 * (j * dim + j)] = step.dense[2 * j]!;
        matrix[2 * (j * dim + j) + 1] = step.dense[2 * j + 1]!;
      }
      return matrix;
    }
    default:
      return Float64Array.from(m);
  }
}

/** Local position (in the fused run's bit list) of each state bit of `mask`. */
function localMask(mask: number, bits: readonly number[]): number {
  let local = 0;
  bits.forEach((b, k) => {
    if ((mask >>> b) & 1) local |= 1 << k;
  });
  return local;
}

/** Applies one piece to the vector (vr, vi) over the run's local bits (shared controls assumed to hold). */
function applyLocal(p: Piece, matrix: Float64Array, bits: readonly number[], vr: Float64Array, vi: Float64Array): void {
  const targets = Array.from(p.step.targets, (t) => 1 << bits.indexOf(t));
  const targetMask = targets.reduce((a, b) => a | b, 0);
  const controls = localMask(p.controls, bits);
  const value = localMask(p.controlValue, bits);
  const dim = 1 << targets.length;
  const offsets = Array.from({ length: dim }, (_, j) => targets.reduce((sum, t, k) => sum + ((j >>> k) & 1) * t, 0));
  const gr = new Float64Array(dim);
  const gi = new Float64Array(dim);
  for (let base = 0; base < vr.length; base++) {
    if ((base & targetMask) !== 0 || (base & controls) !== value) continue;
    for (let c = 0; c < dim; c++) {
      gr[c] = vr[base + offsets[c]!]!;
      gi[c] = vi[base + offsets[c]!]!;
    }
    for (let r = 0; r < dim; r++) {
      let sr = 0;
      let si = 0;
      for (let c = 0; c < dim; c++) {
        const mr = matrix[2 * (r * dim + c)]!;
        const mi = matrix[2 * (r * dim + c) + 1]!;
        sr += mr * gr[c]! - mi * gi[c]!;
        si += mr * gi[c]! + mi * gr[c]!;
      }
      vr[base + offsets[r]!] = sr;
      vi[base + offsets[r]!] = si;
    }
  }
}

/** Estimated cost of a pass per state amplitude (in units of a pair kernel's arithmetic): memory traffic plus arithmetic. */
function passCost(fraction: number, arithmetic: number, memory: number): number {
  return fraction * (memory + arithmetic);
}

/** Measured arithmetic per amplitude relative to a 2×2 pair kernel: a 4 × 4 pass costs about 1.6 of them. */
function arithmeticOf(diagonal: boolean, denseBits: number): number {
  if (diagonal) return 1;
  return denseBits <= 1 ? 1 : 1.6 * 2 ** (2 * (denseBits - 2));
}

function pieceCost(p: Piece, memory: number): number {
  const denseBits = p.step.code === DENSE ? p.step.targets.length : 1;
  // A single phase or diagonal pair pass is a little cheaper than a table pass (no lookup).
  const arithmetic = p.step.code === SCALE || p.step.code === DIAGONAL ? 0.7 : arithmeticOf(p.diagonal, denseBits);
  return passCost(2 ** -bitCount(p.controls), arithmetic, memory);
}

interface Run {
  pieces: Piece[];
  touched: number;
  shared: number;
  sharedValue: number;
  diagonal: boolean;
}

function fusedStep(run: Run, n: number): Step {
  const local = run.touched & ~run.shared;
  const bits = bitsOf(local);
  const dim = 1 << bits.length;
  const offsets = Int32Array.from({ length: dim }, (_, j) => bits.reduce((sum, b, k) => sum + ((j >>> k) & 1) * (1 << b), 0));
  const pattern = indexPattern(n, [...bitsOf(run.shared), ...bits], run.sharedValue);
  const controlPattern = indexPattern(n, bitsOf(run.shared), run.sharedValue);
  const targets = Int32Array.from(bits);
  const matrices = run.pieces.map((p) => targetMatrix(p.step));
  if (run.diagonal) {
    // Each diagonal piece multiplies entry j (basis state j) by its own entry for j.
    const table = new Float64Array(2 * dim);
    const vr = new Float64Array(dim);
    const vi = new Float64Array(dim);
    vr.fill(1);
    run.pieces.forEach((p, k) => applyDiagonalLocal(p, matrices[k]!, bits, vr, vi));
    for (let j = 0; j < dim; j++) {
      table[2 * j] = vr[j]!;
      table[2 * j + 1] = vi[j]!;
    }
    return makeStep({ code: DIAGONAL_TABLE, pattern: controlPattern, targets, dense: table, offsets: diagonalLowLookup(targets) });
  }
  const matrix = new Float64Array(2 * dim * dim);
  let diagonal = true;
  for (let col = 0; col < dim; col++) {
    const vr = new Float64Array(dim);
    const vi = new Float64Array(dim);
    vr[col] = 1;
    run.pieces.forEach((p, k) => applyLocal(p, matrices[k]!, bits, vr, vi));
    for (let r = 0; r < dim; r++) {
      matrix[2 * (r * dim + col)] = vr[r]!;
      matrix[2 * (r * dim + col) + 1] = vi[r]!;
      if (r !== col && (vr[r] !== 0 || vi[r] !== 0)) diagonal = false;
    }
  }
  if (bits.length === 1 && !diagonal) {
    const numbers = Array.from(matrix) as unknown as Matrix2;
    const stride = 1 << bits[0]!;
    if (run.shared === 0) return makeStep({ code: STRIDE, stride, numbers, targets });
    return makeStep({ code: MATRIX, pattern, stride, numbers, targets });
  }
  if (diagonal) {
    const table = new Float64Array(2 * dim);
    for (let j = 0; j < dim; j++) {
      table[2 * j] = matrix[2 * (j * dim + j)]!;
      table[2 * j + 1] = matrix[2 * (j * dim + j) + 1]!;
    }
    return makeStep({ code: DIAGONAL_TABLE, pattern: controlPattern, targets, dense: table, offsets: diagonalLowLookup(targets) });
  }
  return makeStep({ code: DENSE, pattern, targets, dense: matrix, offsets });
}

/** A diagonal piece on a vector of per-basis-state factors: entry j times the piece's entry for j. */
function applyDiagonalLocal(p: Piece, matrix: Float64Array, bits: readonly number[], vr: Float64Array, vi: Float64Array): void {
  const targets = Array.from(p.step.targets, (t) => bits.indexOf(t));
  const controls = localMask(p.controls, bits);
  const value = localMask(p.controlValue, bits);
  const dim = 1 << targets.length;
  for (let j = 0; j < vr.length; j++) {
    if ((j & controls) !== value) continue;
    const t = targets.reduce((sum, b, k) => sum | (((j >>> b) & 1) << k), 0);
    const fr = matrix[2 * (t * dim + t)]!;
    const fi = matrix[2 * (t * dim + t) + 1]!;
    const ar = vr[j]!;
    const ai = vi[j]!;
    vr[j] = fr * ar - fi * ai;
    vi[j] = fr * ai + fi * ar;
  }
}

/** The steps with fusible runs merged (see the file comment); `n` is the state's qubit count. */
export function fuseSteps(steps: readonly Step[], n: number): Step[] {
  const memory = n >= LARGE_STATE_QUBITS ? 1.5 : 0.3;
  const out: Step[] = [];
  let run: Run | null = null;
  const flush = (): void => {
    if (!run) return;
    const pieces = run.pieces;
    run.pieces = [];
    if (pieces.length === 1) {
      out.push(pieces[0]!.step);
      return;
    }
    const localBits = bitCount(run.touched & ~run.shared);
    const fusedCost = passCost(2 ** -bitCount(run.shared), arithmeticOf(run.diagonal, localBits), memory);
    const separateCost = pieces.reduce((sum, p) => sum + pieceCost(p, memory), 0);
    if (fusedCost < separateCost) out.push(fusedStep({ ...run, pieces }, n));
    else for (const p of pieces) out.push(p.step);
  };
  for (const step of steps) {
    if (!KERNEL_CODES.has(step.code)) {
      flush();
      run = null;
      out.push(step);
      continue;
    }
    const p = piece(step);
    if (run && run.pieces.length > 0) {
      const shared = run.shared & p.controls & ~(run.sharedValue ^ p.controlValue);
      const touched = run.touched | p.targets | p.controls;
      const diagonal = run.diagonal && p.diagonal;
      if (bitCount(touched & ~shared) <= (diagonal ? MAX_DIAGONAL_BITS : MAX_DENSE_BITS)) {
        run.pieces.push(p);
        run.shared = shared;
        run.sharedValue &= shared;
        run.touched = touched;
        run.diagonal = diagonal;
        continue;
      }
      flush();
    }
    run = { pieces: [p], touched: p.targets | p.controls, shared: p.controls, sharedValue: p.controlValue, diagonal: p.diagonal };
  }
  flush();
  return out;
}
