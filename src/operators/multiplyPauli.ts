// multiplyPauli: the product a·b of Pauli sums with exact phases, simplified (exact zeros removed).
import { PauliAccumulator } from './internal/PauliAccumulator.js';
import { popcountBig } from './internal/popcount.js';
import type { PauliSum } from './PauliSum.js';

const PHASE_RE = [1, 0, -1, 0];
const PHASE_IM = [0, 1, 0, -1];

/**
 * Per qubit P(x, z) = i^{xz} X^x Z^z and Z X = −X Z, so
 * P(x1, z1) P(x2, z2) = i^{|x1∧z1| + |x2∧z2| + 2|z1∧x2| − |x∧z|} P(x, z) with x = x1 ⊕ x2, z = z1 ⊕ z2.
 */
export function multiplyPauli(a: PauliSum, b: PauliSum): PauliSum {
  const acc = new PauliAccumulator();
  const selfA = a.terms.map((s) => popcountBig(s.x & s.z));
  const selfB = b.terms.map((t) => popcountBig(t.x & t.z));
  a.terms.forEach((s, p) => {
    b.terms.forEach((t, q) => {
      const x = s.x ^ t.x;
      const z = s.z ^ t.z;
      const k = (((selfA[p]! + selfB[q]! + 2 * popcountBig(s.z & t.x) - popcountBig(x & z)) % 4) + 4) % 4;
      const re = s.re * t.re - s.im * t.im;
      const im = s.re * t.im + s.im * t.re;
      acc.add(x, z, re * PHASE_RE[k]! - im * PHASE_IM[k]!, re * PHASE_IM[k]! + im * PHASE_RE[k]!);
    });
  });
  return acc.result(Math.max(a.qubits, b.qubits), 0);
}
