import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { anticommutatorFermion } from '../../src/operators/anticommutatorFermion.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { ladder } from '../../src/operators/ladder.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matAdd, matMul } from '../helpers/complexMatrixOps.js';
import { ladderSumArb } from '../helpers/operatorArbitraries.js';

describe('anticommutatorFermion(a, b)', () => {
  // {a_i, a_j†} = δ_ij, {a_i, a_j} = 0 (Jordan & Wigner 1928, Z. Phys. 47, 631).
  it('gives the canonical anticommutation relations as operators', () => {
    expect(anticommutatorFermion(ladder(1, false), ladder(1, true)).terms).toEqual([{ ops: [], re: 1, im: 0 }]);
    expect(anticommutatorFermion(ladder(1, false), ladder(2, true)).terms).toEqual([]);
    expect(anticommutatorFermion(ladder(0, false), ladder(2, false)).terms).toEqual([]);
  });

  it('has the matrix AB + BA', () => {
    fc.assert(
      fc.property(ladderSumArb(3, 3, 3), ladderSumArb(3, 3, 3), (a, b) => {
        const ma = ladderSumMatrix(a, 3);
        const mb = ladderSumMatrix(b, 3);
        expectComplexArrayClose(ladderSumMatrix(anticommutatorFermion(a, b), 3), matAdd(matMul(ma, mb), matMul(mb, ma)), 1e-12);
      }),
    );
  });
});
