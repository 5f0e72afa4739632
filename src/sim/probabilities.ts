/**
 * probabilities: the marginal distribution of a subset of qubits in a state.
 */
import type { StateVector } from './StateVector.js';

/**
 * Returns p with p[x] = Σ |amplitude|² over the basis states whose bit qubits[k] equals bit k of x,
 * for x in 0 … 2^qubits.length − 1. Throws RangeError for repeated or out-of-range qubits.
 */
export function probabilities(state: StateVector, qubits: readonly number[]): Float64Array {
  const n = state.qubits;
  const seen = new Set<number>();
  for (const q of qubits) {
    if (!Number.isInteger(q) || q < 0 || q >= n) throw new RangeError(`probabilities: qubit ${q} out of range 0..${n - 1}`);
    if (seen.has(q)) throw new RangeError(`probabilities: qubit ${q} listed twice`);
    seen.add(q);
  }
  const { re, im } = state;
  const out = new Float64Array(2 ** qubits.length);
  const identity = qubits.every((q, k) => q === k);
  const mask = 2 ** qubits.length - 1;
  const bits = Int32Array.from(qubits);
  for (let i = 0; i < re.length; i++) {
    const weight = re[i]! * re[i]! + im[i]! * im[i]!;
    if (weight === 0) continue;
    let x = 0;
    if (identity) x = i & mask;
    else for (let k = 0; k < bits.length; k++) x |= ((i >>> bits[k]!) & 1) << k;
    out[x] += weight;
  }
  return out;
}
