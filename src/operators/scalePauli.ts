// scalePauli: a Pauli sum times the complex number re + i·im.
import type { PauliSum } from './PauliSum.js';

/** (re + i·im) · sum. */
export function scalePauli(sum: PauliSum, re: number, im = 0): PauliSum {
  return {
    qubits: sum.qubits,
    terms: sum.terms.map((t) => ({ x: t.x, z: t.z, re: t.re * re - t.im * im, im: t.re * im + t.im * re })),
  };
}
