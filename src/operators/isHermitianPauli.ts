// isHermitianPauli: a Pauli sum is Hermitian exactly when, like strings combined, every coefficient is real.
import type { PauliSum } from './PauliSum.js';
import { simplifyPauli } from './simplifyPauli.js';

/**
 * @param options.tolerance largest |Im c| accepted; default 1e-12 · max(1, largest |c|).
 */
export function isHermitianPauli(sum: PauliSum, options: { tolerance?: number } = {}): boolean {
  const terms = simplifyPauli(sum).terms;
  const tolerance = options.tolerance ?? 1e-12 * Math.max(1, ...terms.map((t) => Math.hypot(t.re, t.im)));
  return terms.every((t) => Math.abs(t.im) <= tolerance);
}
