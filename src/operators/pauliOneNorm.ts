// pauliOneNorm: Σ |c_t| over the terms of a Pauli sum after like strings are combined (identity included).
import type { PauliSum } from './PauliSum.js';
import { simplifyPauli } from './simplifyPauli.js';

/** Σ_t |c_t| after combining equal strings: the LCU normalisation λ of the sum. */
export function pauliOneNorm(sum: PauliSum): number {
  return simplifyPauli(sum).terms.reduce((total, t) => total + Math.hypot(t.re, t.im), 0);
}
