import { describe, expect, it } from 'vitest';
import { call } from '../../src/circuit/ops.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import { StateVector } from '../../src/sim/StateVector.js';
import { applyUnitaryOps } from '../../src/sim/applyUnitaryOps.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { expectClose, expectComplexArrayClose } from '../helpers/close.js';
import { referenceResolvent } from './helpers/referenceResolvent.js';

const popcount = (x: number): number => x.toString(2).split('').filter((b) => b === '1').length;
// Diagonal T with levels −1, 0.5, 2, 3 (multiples of 1/2, so the grid is exact).
function diagonal(levels: readonly number[]) {
  const n = levels.length;
  const D = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  levels.forEach((e, k) => (D.re[k * n + k] = e));
  return D;
}
const T = diagonal([-1, 0.5, 2, 3]);

describe('fastInverse(T, w, { electrons })', () => {
  it('gives zero amplitude to every state outside the electron-number window', () => {
    for (const [adder, electrons, A] of [['qft', [1, 2], T], ['ripple', 1, diagonal([-1, 0.5, 2])]] as const) {
      const dim = 2 ** A.n;
      const encoding = fastInverse(A, { re: 0.7, im: 0.4 }, { electrons, adder });
      const [min, max] = typeof electrons === 'number' ? [electrons, electrons] : electrons;
      const qubits = Array.from({ length: encoding.block.qubits }, (_, q) => q);
      for (let s = 0; s < dim; s++) {
        const state = StateVector.basis(encoding.block.qubits, s);
        applyUnitaryOps(state, [call(encoding.block, qubits)]);
        let weight = 0;
        for (let i = 0; i < dim; i++) weight += state.re[i]! ** 2 + state.im[i]! ** 2;
        const inside = popcount(s) >= min && popcount(s) <= max;
        if (!inside) expect(weight).toBeLessThan(1e-24);
        else expect(weight).toBeGreaterThan(1e-6);
      }
      expectComplexArrayClose(encoding.exact(), referenceResolvent(A, { re: 0.7, im: 0.4 }, { min, max }), 1e-10);
      expect(verifyEncoding(encoding).maxError).toBeLessThan(1e-10);
    }
  }, 60_000);

  it('takes c as the minimum over the sector: the energy range shrinks to the sums of N levels', () => {
    const w = { re: 5, im: 0.25 };
    // Whole Fock space: sums reach 0.5 + 2 + 3 = 5.5 ≥ Re w, so c = Im w. One electron: the highest energy is 3,
    // so c = |5 − 3 + 0.25i| (hand computation from the levels above).
    expectClose(fastInverse(T, w).c, 0.25, 1e-14);
    const one = fastInverse(T, w, { electrons: 1 });
    expectClose(one.c, Math.hypot(2, 0.25), 1e-14);
    // Register values: one electron −1 … 3, the whole space −1 … 5.5, both on the 1/2 grid.
    expect(one.grid.minEnergy).toBe(-1);
    expect(one.grid.values).toBe(9);
    expect(fastInverse(T, w).grid.values).toBe(14);
  });
});
