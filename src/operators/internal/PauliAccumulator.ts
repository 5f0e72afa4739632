// PauliAccumulator: sums coefficients of identical Pauli strings, then drops small ones.
import type { PauliSum, PauliTerm } from '../PauliSum.js';

export class PauliAccumulator {
  private readonly sums = new Map<string, { x: bigint; z: bigint; re: number; im: number }>();

  add(x: bigint, z: bigint, re: number, im: number): void {
    const key = `${x.toString(16)}:${z.toString(16)}`;
    const sum = this.sums.get(key);
    if (sum === undefined) this.sums.set(key, { x, z, re, im });
    else {
      sum.re += re;
      sum.im += im;
    }
  }

  /** Terms with |c| > tolerance (tolerance 0 removes exact zeros only), in first-seen order. */
  result(qubits: number, tolerance: number): PauliSum {
    const terms: PauliTerm[] = [];
    for (const t of this.sums.values()) {
      // + 0 turns −0 into 0 so equal sums compare equal.
      if (Math.hypot(t.re, t.im) > tolerance || (tolerance === 0 && (t.re !== 0 || t.im !== 0))) {
        terms.push({ x: t.x, z: t.z, re: t.re + 0, im: t.im + 0 });
      }
    }
    return { qubits, terms };
  }
}
