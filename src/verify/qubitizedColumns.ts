/**
 * qubitizedColumns: the projected block of a QSVT encoding on the basis columns of a system subspace S without running its
 * d queries, so that `check` can verify sequences whose full simulation (d block calls per column) is out of reach. The
 * queried block U is simulated gate by gate on |0_anc, x> for x in S, forwards and inverted (2|S| runs); by Jordan's lemma
 * the sequence then acts on each pair (right singular vector of A = <0|U|0> on S, its image) through 2×2 reflections and
 * phases (Gilyén, Su, Low & Wiebe, STOC 2019, Sec. 3), so its projected block on S is the singular-value transform of A by
 * the value the circuit's own phases give (reflectionSequenceValue). The premises are measured, not assumed: U and U† must
 * return every clean ancilla to |0> and keep the signal-|0> part inside S; what they leave outside is the `leak`, and
 * `allowance` bounds what the leak can change in the sequence's block. A test holds this equal to the full simulation of the
 * sequence on models small enough for both.
 */
import { ancillaRoles, type BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { singularValueFunction } from '../linalg/singularValueFunction.js';
import type { QsvtEncoding } from '../qsvt/qsvtEncoding.js';
import { reflectionSequenceValue } from '../qsvt/reflectionSequenceValue.js';
import type { SimulationOptions } from '../sim/SimulationOptions.js';
import { onZeroAncillas } from './verifyEncoding.js';

/** A block's projected entries on S: entry (r, c) = <0_anc, S_r| U |0_anc, S_c>, row-major. */
export interface SubspaceBlock {
  readonly block: ComplexMatrix;
  /** Largest norm, over the simulated columns, of the output parts the reduction assumes to be zero. */
  readonly leak: number;
  /** Largest | ‖U|0, x>‖ − 1 | over the simulated columns. */
  readonly normDeviation: number;
  /** Bound on how far the projected block on S can be from `block` because of the leak. */
  readonly allowance: number;
}

/**
 * Simulates the encoding's block (or its inverse) on |0_anc, x> for every x in `columns` and reads the signal-|0> rows in
 * S; the leak counts any clean ancilla left set and any signal-|0>, clean-|0> amplitude on a system state outside S.
 */
export function subspaceColumns(encoding: BlockEncoding, columns: readonly number[], options: SimulationOptions, inverse = false): SubspaceBlock {
  const n = encoding.systemQubits;
  const m = columns.length;
  const rowOf = new Int32Array(2 ** n).fill(-1);
  columns.forEach((x, r) => {
    if (!Number.isInteger(x) || x < 0 || x >= 2 ** n) throw new RangeError(`subspaceColumns: column ${x} is not a basis state of ${n} qubits`);
    rowOf[x] = r;
  });
  const run = onZeroAncillas(encoding, options, inverse);
  const roles = ancillaRoles(encoding);
  let signalMask = 0;
  let cleanMask = 0;
  run.kept.forEach((local, bit) => {
    if (local < n) return;
    if (roles[local - n] === 'signal') signalMask += 2 ** bit;
    else cleanMask += 2 ** bit;
  });
  const systemMask = 2 ** n - 1;
  const re = new Float64Array(m * m);
  const im = new Float64Array(m * m);
  let leak = 0;
  let normDeviation = 0;
  columns.forEach((x, c) => {
    const state = run.runBasis(x);
    let outside = 0;
    let norm = 0;
    for (let i = 0; i < state.re.length; i++) {
      const p = state.re[i]! ** 2 + state.im[i]! ** 2;
      norm += p;
      if (p === 0) continue;
      if ((i & cleanMask) !== 0) outside += p;
      else if ((i & signalMask) === 0) {
        const r = rowOf[i & systemMask]!;
        if (r < 0) outside += p;
        else {
          re[r * m + c] = state.re[i]!;
          im[r * m + c] = state.im[i]!;
        }
      }
    }
    leak = Math.max(leak, Math.sqrt(outside));
    normDeviation = Math.max(normDeviation, Math.abs(Math.sqrt(norm) - 1));
  });
  // A leak of norm ℓ per column moves the block on S by at most √m·ℓ in operator norm (triangle inequality over columns).
  return { block: { n: m, re, im }, leak, normDeviation, allowance: Math.sqrt(m) * leak };
}

/**
 * The projected block on S of a QSVT encoding: A from its queried block (forwards, and inverted for the leak of U† only),
 * then W f(Σ) V† (odd degree) or V f(Σ) V† (even) with f from the circuit's reflection phases. Every one of the d queries can
 * add the queried block's allowance, so the allowance is d times it, for U and U† each.
 */
export function qsvtSubspaceBlock(qsvt: QsvtEncoding, columns: readonly number[], options: SimulationOptions): SubspaceBlock {
  const forward = subspaceColumns(qsvt.queried, columns, options);
  const backward = subspaceColumns(qsvt.queried, columns, options, true);
  // The sequence sees the simulated amplitudes <0|U|0> themselves (M/α of the queried encoding), so no rescaling.
  const block = singularValueFunction(forward.block, (sigma) => reflectionSequenceValue(qsvt.reflectionPhases, Math.min(1, sigma)), qsvt.parity);
  return {
    block,
    leak: Math.max(forward.leak, backward.leak),
    normDeviation: Math.max(forward.normDeviation, backward.normDeviation),
    allowance: qsvt.degree * (forward.allowance + backward.allowance),
  };
}
