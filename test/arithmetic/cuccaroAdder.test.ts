import { describe, expect, it } from 'vitest';
import { cuccaroAdder } from '../../src/arithmetic/cuccaroAdder.js';
import { blockCounts } from '../../src/circuit/gateCounts.js';
import { call } from '../../src/circuit/ops.js';
import { basisImage } from './helpers/basisImage.js';

const range = (n: number): number[] => Array.from({ length: n }, (_, k) => k);

describe('cuccaroAdder(width)', () => {
  it('computes b ← a + b + c0 mod 2^n on every basis state and restores a and c0 (n ≤ 4)', () => {
    for (let n = 1; n <= 4; n++) {
      const size = 2 ** n;
      const block = cuccaroAdder(n);
      for (let input = 0; input < 2 ** (2 * n + 1); input++) {
        const a = input % size;
        const b = Math.floor(input / size) % size;
        const c = input >> (2 * n);
        const out = basisImage(2 * n + 1, input, [call(block, range(2 * n + 1))], false).index;
        expect(out).toBe(a + ((a + b + c) % size) * size + c * size * size);
      }
    }
  });

  it('with a carry-out qubit also flips z by the carry of a + b + c0 (n ≤ 4)', () => {
    for (let n = 1; n <= 4; n++) {
      const size = 2 ** n;
      const block = cuccaroAdder(n, { carryOut: true });
      for (let input = 0; input < 2 ** (2 * n + 2); input++) {
        const a = input % size;
        const b = Math.floor(input / size) % size;
        const c = (input >> (2 * n)) & 1;
        const z = input >> (2 * n + 1);
        const sum = a + b + c;
        const out = basisImage(2 * n + 2, input, [call(block, range(2 * n + 2))], false).index;
        expect(out).toBe(a + (sum % size) * size + c * size * size + (z ^ (sum >= size ? 1 : 0)) * 2 * size * size);
      }
    }
  });

  it('uses 2n − 1 Toffolis with the carry out and 2n − 2 modulo 2^n', () => {
    for (let n = 1; n <= 10; n++) {
      // Cuccaro, Draper, Kutin & Moulton, arXiv:quant-ph/0410184 (2004): the n-bit adder with its high (carry-out) bit
      // takes 2n − 1 Toffoli gates (from memory).
      expect(blockCounts(cuccaroAdder(n, { carryOut: true })).get('ccx') ?? 0).toBe(2 * n - 1);
      // Without the high bit the top position needs no Toffoli: one MAJ and one UMA (one Toffoli each) for each
      // of the n − 1 lower bits (derived from the same paper's MAJ/UMA construction).
      expect(blockCounts(cuccaroAdder(n)).get('ccx') ?? 0).toBe(2 * n - 2);
    }
  });
});
