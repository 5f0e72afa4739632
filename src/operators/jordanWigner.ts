// jordanWigner: maps a LadderSum to a PauliSum with a_j = Z_0 … Z_{j−1} (X_j + iY_j)/2
// (../shared/CONVENTIONS.md; Jordan & Wigner 1928, Z. Phys. 47, 631).
import type { LadderSum } from './LadderSum.js';
import { PauliAccumulator } from './internal/PauliAccumulator.js';
import { multiplyPauli } from './multiplyPauli.js';
import type { PauliSum } from './PauliSum.js';

/**
 * @param modes register size n; mode j is qubit j. Every mode of `op` must be < n.
 * @returns the simplified image (like strings combined, exact zeros removed).
 * @throws RangeError when a mode is ≥ modes.
 */
export function jordanWigner(op: LadderSum, modes: number): PauliSum {
  const images = new Map<number, PauliSum>();
  const image = (mode: number, dagger: boolean): PauliSum => {
    if (mode >= modes) throw new RangeError(`jordanWigner: mode ${mode} ≥ modes ${modes}`);
    const key = 2 * mode + (dagger ? 1 : 0);
    let sum = images.get(key);
    if (sum === undefined) {
      const bit = 1n << BigInt(mode);
      const below = bit - 1n;
      // a_j = ½ Z_<j X_j + ½ i Z_<j Y_j ; a_j† = ½ Z_<j X_j − ½ i Z_<j Y_j
      sum = {
        qubits: modes,
        terms: [
          { x: bit, z: below, re: 0.5, im: 0 },
          { x: bit, z: below | bit, re: 0, im: dagger ? -0.5 : 0.5 },
        ],
      };
      images.set(key, sum);
    }
    return sum;
  };
  const acc = new PauliAccumulator();
  for (const term of op.terms) {
    let product: PauliSum = { qubits: modes, terms: [{ x: 0n, z: 0n, re: term.re, im: term.im }] };
    for (const { mode, dagger } of term.ops) product = multiplyPauli(product, image(mode, dagger));
    for (const t of product.terms) acc.add(t.x, t.z, t.re, t.im);
  }
  return acc.result(modes, 0);
}
