// pauliSumMatrix: the dense 2^n × 2^n matrix of a Pauli sum (n ≤ 12), little-endian: qubit q is bit q of the index.
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { popcount32 } from './internal/popcount.js';
import type { PauliSum } from './PauliSum.js';

/** Largest register pauliSumMatrix accepts. */
export const MAX_DENSE_QUBITS = 12;

const PHASE_RE = [1, 0, -1, 0];
const PHASE_IM = [0, 1, 0, -1];

/**
 * P(x, z)|c> = i^{|x∧z|} (−1)^{|z∧c|} |c ⊕ x>, so each term fills one entry per column.
 * @throws RangeError when sum.qubits > 12.
 */
export function pauliSumMatrix(sum: PauliSum): ComplexMatrix {
  if (sum.qubits > MAX_DENSE_QUBITS) throw new RangeError(`pauliSumMatrix: ${sum.qubits} qubits > ${MAX_DENSE_QUBITS}`);
  const dim = 1 << sum.qubits;
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (const t of sum.terms) {
    const x = Number(t.x);
    const z = Number(t.z);
    const k = popcount32(x & z) % 4;
    const cRe = t.re * PHASE_RE[k]! - t.im * PHASE_IM[k]!;
    const cIm = t.re * PHASE_IM[k]! + t.im * PHASE_RE[k]!;
    for (let c = 0; c < dim; c++) {
      const s = (popcount32(z & c) & 1) === 0 ? 1 : -1;
      const e = (c ^ x) * dim + c;
      re[e]! += s * cRe;
      im[e]! += s * cIm;
    }
  }
  return { n: dim, re, im };
}
