import { describe, expect, it } from 'vitest';
import { blockCounts, totalGates } from '../../src/circuit/gateCounts.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';

/** Hopping −t on a ring of L sites plus an on-site level, one spin: T = s·(−0.7137(δ_{i,j±1}) + 0.3137 δ_ij). */
function ring(L: number, s: number) {
  const T = { n: L, re: new Float64Array(L * L), im: new Float64Array(L * L) };
  for (let i = 0; i < L; i++) {
    T.re[i * L + i] = 0.3137 * s;
    T.re[i * L + ((i + 1) % L)] = T.re[((i + 1) % L) * L + i] = -0.7137 * s;
  }
  return T;
}

describe('fastInverse cost versus ‖A‖', () => {
  it('keeps α ≤ 1/|Im w| and grows its gate count no faster than the register width when A is scaled by s', () => {
    const w = { re: 0.37, im: 0.2 };
    const base = fastInverse(ring(4, 1), w, { precision: 0.05, maxBits: 24 });
    const baseGates = totalGates(blockCounts(base.block));
    for (const s of [1, 10, 100, 1000]) {
      const encoding = fastInverse(ring(4, s), w, { precision: 0.05, maxBits: 24 });
      expect(encoding.bitsCapped).toBe(false);
      expect(encoding.alpha).toBeLessThanOrEqual(1 / w.im + 1e-12);
      expect(encoding.registerBits - base.registerBits).toBeLessThanOrEqual(Math.ceil(Math.log2(s)) + 1);
      const gates = totalGates(blockCounts(encoding.block));
      // Gates grow in proportion to the register width m (the QFT's m² part is small at these widths): the
      // growth ratio stays within 1.5× the width ratio, and m itself grows like log2 s.
      expect(gates / baseGates).toBeLessThanOrEqual(1.5 * (encoding.registerBits / base.registerBits));
    }
  });
});
