import { describe, expect, it } from 'vitest';
import { quantumFourierTransform } from '../../src/arithmetic/quantumFourierTransform.js';
import { blockCounts } from '../../src/circuit/gateCounts.js';
import { call } from '../../src/circuit/ops.js';
import { StateVector } from '../../src/sim/StateVector.js';
import { applyUnitaryOps } from '../../src/sim/applyUnitaryOps.js';
import { expectComplexClose } from '../helpers/close.js';

describe('quantumFourierTransform(width)', () => {
  it('uses width Hadamards, width(width−1)/2 controlled phases and ⌊width/2⌋ swaps', () => {
    for (let n = 1; n <= 7; n++) {
      // Nielsen & Chuang, Quantum Computation and Quantum Information, §5.1: n Hadamards and n(n−1)/2 controlled
      // rotations R_k, plus at most n/2 swaps at the end (from memory).
      const swapped = blockCounts(quantumFourierTransform(n));
      expect(swapped.get('h')).toBe(n);
      expect(swapped.get('cp') ?? 0).toBe((n * (n - 1)) / 2);
      expect(swapped.get('swap') ?? 0).toBe(Math.floor(n / 2));
      const bare = blockCounts(quantumFourierTransform(n, { swaps: false }));
      expect([...bare.keys()].sort()).toEqual(n === 1 ? ['h'] : ['cp', 'h']);
      expect(bare.get('cp') ?? 0).toBe((n * (n - 1)) / 2);
    }
  });

  it('maps |x> to 2^{−n/2} Σ_y e^{2πi xy/2^n} |y>', () => {
    for (let n = 1; n <= 4; n++) {
      const size = 2 ** n;
      const block = quantumFourierTransform(n);
      for (let x = 0; x < size; x++) {
        const state = StateVector.basis(n, x);
        applyUnitaryOps(state, [call(block, Array.from({ length: n }, (_, q) => q))]);
        for (let y = 0; y < size; y++) {
          // The discrete Fourier transform as the QFT's definition (Nielsen & Chuang eq. 5.2, from memory).
          const angle = (2 * Math.PI * x * y) / size;
          expectComplexClose([state.re[y]!, state.im[y]!], [Math.cos(angle) / Math.sqrt(size), Math.sin(angle) / Math.sqrt(size)], 1e-12);
        }
      }
    }
  });
});
