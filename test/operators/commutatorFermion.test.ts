import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { commutatorFermion } from '../../src/operators/commutatorFermion.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../src/operators/fermionProduct.js';
import { ladder } from '../../src/operators/ladder.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matAdd, matMul } from '../helpers/complexMatrixOps.js';
import { ladderSumArb } from '../helpers/operatorArbitraries.js';

describe('commutatorFermion(a, b)', () => {
  it('gives [n_0, a†_0] = a†_0', () => {
    const n0 = fermionProduct([{ mode: 0, dagger: true }, { mode: 0, dagger: false }]);
    expect(commutatorFermion(n0, ladder(0, true)).terms).toEqual(ladder(0, true).terms);
  });

  it('has the matrix AB − BA', () => {
    fc.assert(
      fc.property(ladderSumArb(3, 3, 3), ladderSumArb(3, 3, 3), (a, b) => {
        const ma = ladderSumMatrix(a, 3);
        const mb = ladderSumMatrix(b, 3);
        expectComplexArrayClose(ladderSumMatrix(commutatorFermion(a, b), 3), matAdd(matMul(ma, mb), matMul(mb, ma), -1), 1e-12);
      }),
    );
  });
});
