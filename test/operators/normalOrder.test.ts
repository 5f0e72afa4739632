import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../src/operators/fermionProduct.js';
import { normalOrder } from '../../src/operators/normalOrder.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { ladderSumArb } from '../helpers/operatorArbitraries.js';

const c = (mode: number) => ({ mode, dagger: true });
const a = (mode: number) => ({ mode, dagger: false });

describe('normalOrder(op, options)', () => {
  it('rewrites a_0 a†_0 as 1 − a†_0 a_0 (canonical anticommutation relation)', () => {
    expect(normalOrder(fermionProduct([a(0), c(0)])).terms).toEqual([
      { ops: [], re: 1, im: 0 },
      { ops: [c(0), a(0)], re: -1, im: 0 },
    ]);
  });

  it('sorts creators ascending and annihilators descending with the permutation sign', () => {
    // a†2 a†0 a1 a3 = (−1)(−1) a†0 a†2 a3 a1: one swap on each side.
    expect(normalOrder(fermionProduct([c(2), c(0), a(1), a(3)], 2)).terms).toEqual([
      { ops: [c(0), c(2), a(3), a(1)], re: 2, im: 0 },
    ]);
    expect(normalOrder(fermionProduct([a(1), c(2)])).terms).toEqual([{ ops: [c(2), a(1)], re: -1, im: 0 }]);
  });

  it('sends repeated factors a_i a_i and a†_i … a†_i to zero', () => {
    expect(normalOrder(fermionProduct([a(1), a(1)])).terms).toEqual([]);
    expect(normalOrder(fermionProduct([c(1), c(0), c(1)])).terms).toEqual([]);
  });

  it('combines like terms and removes those that cancel', () => {
    const op = { terms: [...fermionProduct([c(0), c(1)]).terms, ...fermionProduct([c(1), c(0)]).terms] };
    expect(normalOrder(op).terms).toEqual([]);
  });

  it('drops terms at or below a tolerance', () => {
    const op = { terms: [...fermionProduct([c(0)], 1e-15).terms, ...fermionProduct([c(1)]).terms] };
    expect(normalOrder(op, { tolerance: 1e-12 }).terms).toEqual([{ ops: [c(1)], re: 1, im: 0 }]);
  });

  it('preserves the Fock-space matrix and yields canonical products', () => {
    fc.assert(
      fc.property(ladderSumArb(3, 4, 5), (op) => {
        const ordered = normalOrder(op);
        expectComplexArrayClose(ladderSumMatrix(ordered, 3), ladderSumMatrix(op, 3), 1e-12);
        for (const t of ordered.terms) {
          const creators = t.ops.filter((o) => o.dagger).map((o) => o.mode);
          const annihilators = t.ops.filter((o) => !o.dagger).map((o) => o.mode);
          expect(t.ops.slice(0, creators.length).every((o) => o.dagger)).toBe(true);
          expect(creators.every((m, k) => k === 0 || m > creators[k - 1]!)).toBe(true);
          expect(annihilators.every((m, k) => k === 0 || m < annihilators[k - 1]!)).toBe(true);
        }
      }),
      { numRuns: 200 },
    );
  });
});
