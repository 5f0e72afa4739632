/**
 * targetAction: a TargetOperator as a map on state vectors of the system register, without forming Pauli or ladder
 * sums densely (so random probes work beyond the dense limit). Ladder sums go through Jordan–Wigner first.
 */
import { jordanWigner } from '../operators/jordanWigner.js';
import type { PauliSum } from '../operators/PauliSum.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { targetSizeProblem, type TargetOperator } from './TargetOperator.js';
import { popcount32 } from '../operators/internal/popcount.js';
import { matrixColumn } from '../linalg/matrixColumn.js';

export interface ComplexVector {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

export interface TargetAction {
  /** 2^qubits. */
  readonly dimension: number;
  /** M x for x of `dimension` amplitudes. */
  apply(x: ComplexVector): ComplexVector;
  /** M e_j. */
  column(j: number): ComplexVector;
}

/** Most system qubits an action is built for (basis indices stay 32-bit). */
const MAX_ACTION_QUBITS = 30;

/** @throws RangeError when `target` cannot act on `qubits` qubits (see targetSizeProblem) or qubits > 30. */
export function targetAction(target: TargetOperator, qubits: number): TargetAction {
  const problem = targetSizeProblem(target, qubits);
  if (problem !== undefined) throw new RangeError(`targetAction: ${problem}`);
  if (!Number.isInteger(qubits) || qubits < 0 || qubits > MAX_ACTION_QUBITS) throw new RangeError(`targetAction: ${qubits} qubits out of range 0…${MAX_ACTION_QUBITS}`);
  if ('matrix' in target) return denseAction(target.matrix);
  return pauliAction('pauli' in target ? target.pauli : jordanWigner(target.ladder, qubits));
}

function denseAction(M: ComplexMatrix): TargetAction {
  const dim = M.n;
  return {
    dimension: dim,
    apply(x) {
      const re = new Float64Array(dim);
      const im = new Float64Array(dim);
      for (let i = 0; i < dim; i++) {
        let sr = 0;
        let si = 0;
        for (let j = 0; j < dim; j++) {
          const mr = M.re[i * dim + j]!;
          const mi = M.im[i * dim + j]!;
          sr += mr * x.re[j]! - mi * x.im[j]!;
          si += mr * x.im[j]! + mi * x.re[j]!;
        }
        re[i] = sr;
        im[i] = si;
      }
      return { re, im };
    },
    column: (j) => matrixColumn(M, j),
  };
}


/** Powers of i: i^k for k = 0…3. */
const I_POWER_RE = [1, 0, -1, 0];
const I_POWER_IM = [0, 1, 0, -1];

/** P(x, z)|c> = i^{|x∧z|} (−1)^{|z∧c|} |c ⊕ x> (Y = iXZ), so a term moves each amplitude to one place. */
function pauliAction(sum: PauliSum): TargetAction {
  const dim = 2 ** sum.qubits;
  const terms = sum.terms.map((t) => {
    const x = Number(t.x);
    const z = Number(t.z);
    const k = popcount32(x & z) % 4;
    return { x, z, re: t.re * I_POWER_RE[k]! - t.im * I_POWER_IM[k]!, im: t.re * I_POWER_IM[k]! + t.im * I_POWER_RE[k]! };
  });
  return {
    dimension: dim,
    apply(input) {
      const re = new Float64Array(dim);
      const im = new Float64Array(dim);
      for (const t of terms) {
        for (let c = 0; c < dim; c++) {
          const ar = input.re[c]!;
          const ai = input.im[c]!;
          if (ar === 0 && ai === 0) continue;
          const s = (popcount32(t.z & c) & 1) === 0 ? 1 : -1;
          const target = c ^ t.x;
          re[target]! += s * (t.re * ar - t.im * ai);
          im[target]! += s * (t.re * ai + t.im * ar);
        }
      }
      return { re, im };
    },
    column(j) {
      const re = new Float64Array(dim);
      const im = new Float64Array(dim);
      for (const t of terms) {
        const s = (popcount32(t.z & j) & 1) === 0 ? 1 : -1;
        re[j ^ t.x]! += s * t.re;
        im[j ^ t.x]! += s * t.im;
      }
      return { re, im };
    },
  };
}
