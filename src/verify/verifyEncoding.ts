/**
 * verifyEncoding: checks a block-encoding against a reference operator (its exact M by default) by simulation. Up to 12
 * qubits in total every column of <0_anc| U |0_anc> is extracted (exhaustive); `columns` extracts exactly the given system
 * basis columns; above the limit, random system states are probed — the ancilla-|0> part of U|ψ,0> against M|ψ>/α, a lower
 * bound on the error — and a power iteration on E†E, E = <0|U|0> − M/α, estimates the operator-norm error.
 */
import { randomUnitVector } from '../core/randomUnitVector.js';
import { seededRandom } from '../core/seededRandom.js';
import { ancillaQubits, type BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { StateVector } from '../sim/StateVector.js';
import { prepareBlockOnZeroAncillas, type BlockOnZeroAncillas } from '../sim/simulateBlockOnZeroAncillas.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';
import { matrixColumn } from '../linalg/matrixColumn.js';

/** The operator an encoding is checked against, given by its action (so it need not be formed densely). */
export interface ReferenceOperator {
  /** 2^n for n system qubits. */
  readonly dimension: number;
  apply(re: Float64Array, im: Float64Array): { re: Float64Array; im: Float64Array };
  applyAdjoint(re: Float64Array, im: Float64Array): { re: Float64Array; im: Float64Array };
  /** Column j (M e_j); default: apply to the basis vector. */
  column?(j: number): { re: Float64Array; im: Float64Array };
}

export interface VerifyOptions extends SimulationOptions {
  /** Largest total qubit count checked column by column (default 12). */
  readonly exhaustiveLimit?: number;
  /** Check exactly these system basis columns (method `columns`), whatever the width. */
  readonly columns?: readonly number[];
  /** Number of random probes above the limit (default 8). */
  readonly probes?: number;
  /** Power-iteration steps of the probe method (default 8; each simulates U once and U† once). */
  readonly powerIterations?: number;
  readonly seed?: number;
  /** The operator to compare with; default the encoding's exact(). */
  readonly reference?: ReferenceOperator;
}

export interface VerifyReport {
  readonly method: 'exhaustive' | 'columns' | 'probe';
  /**
   * Max |<i,0|U|j,0> − M_ij/α| over all (exhaustive) or the given (columns) columns j; probe: max entry error of the
   * post-selected outputs of random states, a lower bound on the operator-norm error.
   */
  readonly maxError: number;
  /** Max |<U e_i, U e_j> − δ_ij| over the simulated input columns, or |‖Uψ‖ − 1| (probe). */
  readonly unitarityDeviation: number;
  readonly probes: number;
  /** Probe only: ‖E x‖ for the power iteration's unit vectors x (a lower estimate of ‖E‖ that improves with iterations). */
  readonly powerIteration?: { readonly estimate: number; readonly iterations: number };
}

/** A dense matrix as a reference operator. */
export function denseReference(M: ComplexMatrix): ReferenceOperator {
  const dim = M.n;
  const product = (re: Float64Array, im: Float64Array, adjoint: boolean) => {
    const outRe = new Float64Array(dim);
    const outIm = new Float64Array(dim);
    for (let i = 0; i < dim; i++) {
      let sr = 0;
      let si = 0;
      for (let j = 0; j < dim; j++) {
        const e = adjoint ? j * dim + i : i * dim + j;
        const mr = M.re[e]!;
        const mi = adjoint ? -M.im[e]! : M.im[e]!;
        sr += mr * re[j]! - mi * im[j]!;
        si += mr * im[j]! + mi * re[j]!;
      }
      outRe[i] = sr;
      outIm[i] = si;
    }
    return { re: outRe, im: outIm };
  };
  return {
    dimension: dim,
    apply: (re, im) => product(re, im, false),
    applyAdjoint: (re, im) => product(re, im, true),
    column: (j) => matrixColumn(M, j),
  };
}

/** U (or U†) compiled for inputs |x>_system ⊗ |0>_ancillas; ancillas that only native kernels use stay out of the state. */
export function onZeroAncillas(encoding: BlockEncoding, options: SimulationOptions, inverse = false): BlockOnZeroAncillas {
  const n = encoding.systemQubits;
  const idleZero = Array.from({ length: encoding.block.qubits - n }, (_, k) => n + k);
  return prepareBlockOnZeroAncillas(encoding.block, { ...options, idleZero, inverse });
}

/** Column j of the reference operator. */
export function referenceColumn(reference: ReferenceOperator, j: number): { re: Float64Array; im: Float64Array } {
  if (reference.column) return reference.column(j);
  const re = new Float64Array(reference.dimension);
  re[j] = 1;
  return reference.apply(re, new Float64Array(reference.dimension));
}

/** Columns j of <0|U|0> against M e_j/α: the largest entry error, and the Gram deviation of the simulated columns. */
function checkColumns(encoding: BlockEncoding, reference: ReferenceOperator, columns: readonly number[], options: SimulationOptions) {
  const n = encoding.systemQubits;
  const dim = 2 ** n;
  const scale = 1 / encoding.alpha;
  const states: StateVector[] = [];
  const run = onZeroAncillas(encoding, options);
  let maxError = 0;
  for (const j of columns) {
    if (!Number.isInteger(j) || j < 0 || j >= dim) throw new RangeError(`verifyEncoding: column ${j} is not a basis state of ${n} qubits`);
    const state = run.runBasis(j);
    const expected = referenceColumn(reference, j);
    for (let i = 0; i < dim; i++) {
      maxError = Math.max(maxError, Math.hypot(state.re[i]! - expected.re[i]! * scale, state.im[i]! - expected.im[i]! * scale));
    }
    states.push(state);
  }
  let unitarityDeviation = 0;
  for (let a = 0; a < states.length; a++) {
    for (let b = a; b < states.length; b++) {
      const u = states[a]!;
      const v = states[b]!;
      let re = 0;
      let im = 0;
      for (let k = 0; k < u.re.length; k++) {
        re += u.re[k]! * v.re[k]! + u.im[k]! * v.im[k]!;
        im += u.re[k]! * v.im[k]! - u.im[k]! * v.re[k]!;
      }
      unitarityDeviation = Math.max(unitarityDeviation, Math.hypot(re - (a === b ? 1 : 0), im));
    }
  }
  return { maxError, unitarityDeviation };
}

/** E x (or E† x) with E = <0|U|0> − M/α: simulate U (U†) on |x, 0_anc>, keep the ancilla-|0> part, subtract (M or M†) x/α. */
function errorApplied(encoding: BlockEncoding, reference: ReferenceOperator, x: { re: Float64Array; im: Float64Array }, adjoint: boolean, runner: BlockOnZeroAncillas) {
  const dim = x.re.length;
  const state = runner.run(x.re, x.im);
  const exact = adjoint ? reference.applyAdjoint(x.re, x.im) : reference.apply(x.re, x.im);
  const scale = 1 / encoding.alpha;
  const out = { re: new Float64Array(dim), im: new Float64Array(dim), norm: 0, state };
  for (let i = 0; i < dim; i++) {
    out.re[i] = state.re[i]! - exact.re[i]! * scale;
    out.im[i] = state.im[i]! - exact.im[i]! * scale;
    out.norm += out.re[i]! ** 2 + out.im[i]! ** 2;
  }
  out.norm = Math.sqrt(out.norm);
  return out;
}

function probe(encoding: BlockEncoding, reference: ReferenceOperator, options: VerifyOptions): VerifyReport {
  const dim = 2 ** encoding.systemQubits;
  const probes = options.probes ?? 8;
  const random = seededRandom(options.seed ?? 7);
  let maxError = 0;
  let unitarityDeviation = 0;
  const forward = onZeroAncillas(encoding, options);
  const backward = onZeroAncillas(encoding, options, true);
  for (let p = 0; p < probes; p++) {
    const x = randomUnitVector(dim, random);
    const error = errorApplied(encoding, reference, x, false, forward);
    for (let i = 0; i < dim; i++) maxError = Math.max(maxError, Math.hypot(error.re[i]!, error.im[i]!));
    unitarityDeviation = Math.max(unitarityDeviation, Math.abs(error.state.norm() - 1));
  }
  // Power iteration on E†E (Golub & Van Loan, Matrix Computations, 4th ed., §8.2.1): ‖E x‖ for unit x rises towards ‖E‖.
  let x = randomUnitVector(dim, random);
  let estimate = 0;
  let iterations = 0;
  for (let step = 0; step < (options.powerIterations ?? 8); step++) {
    iterations++;
    const y = errorApplied(encoding, reference, x, false, forward);
    estimate = Math.max(estimate, y.norm);
    if (y.norm === 0) break;
    const z = errorApplied(encoding, reference, y, true, backward);
    if (z.norm === 0) break;
    x = { re: z.re.map((v) => v / z.norm), im: z.im.map((v) => v / z.norm) };
  }
  return { method: 'probe', maxError, unitarityDeviation, probes, powerIteration: { estimate, iterations } };
}

export function verifyEncoding(encoding: BlockEncoding, options: VerifyOptions = {}): VerifyReport {
  const n = encoding.systemQubits;
  const total = n + ancillaQubits(encoding);
  const dim = 2 ** n;
  const reference = options.reference ?? denseReference(encoding.exact());
  if (reference.dimension !== dim) throw new RangeError(`verifyEncoding: reference dimension ${reference.dimension} ≠ 2^${n}`);
  if (options.columns !== undefined) {
    return { method: 'columns', ...checkColumns(encoding, reference, options.columns, options), probes: options.columns.length };
  }
  if (total <= (options.exhaustiveLimit ?? 12)) {
    const all = Array.from({ length: dim }, (_, j) => j);
    return { method: 'exhaustive', ...checkColumns(encoding, reference, all, options), probes: dim };
  }
  return probe(encoding, reference, options);
}
