// addPauli: the sum of Pauli sums (terms concatenated, on the largest register); simplifyPauli combines them.
import type { PauliSum } from './PauliSum.js';

/** a + b + … on max(qubits); terms are concatenated, not combined (see simplifyPauli). */
export function addPauli(...sums: readonly PauliSum[]): PauliSum {
  return { qubits: Math.max(0, ...sums.map((s) => s.qubits)), terms: sums.flatMap((s) => s.terms) };
}
