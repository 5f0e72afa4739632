// pauliProduct: a one-term PauliSum c · P from single-qubit factors such as [[0, 'X'], [3, 'Z']].
import type { PauliSum } from './PauliSum.js';

/**
 * @param qubits register size; every factor's qubit must lie in 0..qubits−1 and appear at most once.
 * @param factors [qubit, 'X' | 'Y' | 'Z'] pairs; [] gives the identity.
 * @param re,im the coefficient c (default 1).
 */
export function pauliProduct(
  qubits: number,
  factors: readonly (readonly [number, 'X' | 'Y' | 'Z'])[],
  re = 1,
  im = 0,
): PauliSum {
  let x = 0n;
  let z = 0n;
  for (const [q, p] of factors) {
    if (!Number.isInteger(q) || q < 0 || q >= qubits) throw new RangeError(`pauliProduct: qubit ${q} out of range`);
    const bit = 1n << BigInt(q);
    if (((x | z) & bit) !== 0n) throw new RangeError(`pauliProduct: qubit ${q} given twice`);
    if (p !== 'Z') x |= bit;
    if (p !== 'X') z |= bit;
  }
  return { qubits, terms: [{ x, z, re, im }] };
}
