// simplifyPauli: combines terms with the same Pauli string and removes (near-)zero terms.
import { PauliAccumulator } from './internal/PauliAccumulator.js';
import type { PauliSum } from './PauliSum.js';

/** @param options.tolerance drop terms with |c| ≤ tolerance; default 0 removes exact zeros only. */
export function simplifyPauli(sum: PauliSum, options: { tolerance?: number } = {}): PauliSum {
  const acc = new PauliAccumulator();
  for (const t of sum.terms) acc.add(t.x, t.z, t.re, t.im);
  return acc.result(sum.qubits, options.tolerance ?? 0);
}
