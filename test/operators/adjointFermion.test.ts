import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { adjointFermion } from '../../src/operators/adjointFermion.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../src/operators/fermionProduct.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { conjTranspose } from '../helpers/complexMatrixOps.js';
import { ladderSumArb } from '../helpers/operatorArbitraries.js';

describe('adjointFermion(op)', () => {
  it('reverses the factors, flips daggers and conjugates the coefficient', () => {
    const op = fermionProduct([{ mode: 0, dagger: true }, { mode: 2, dagger: false }], 1, 2);
    expect(adjointFermion(op).terms).toEqual([
      { ops: [{ mode: 2, dagger: true }, { mode: 0, dagger: false }], re: 1, im: -2 },
    ]);
  });

  it('has the conjugate-transpose matrix', () => {
    fc.assert(
      fc.property(ladderSumArb(3), (op) => {
        expectComplexArrayClose(ladderSumMatrix(adjointFermion(op), 3), conjTranspose(ladderSumMatrix(op, 3)), 1e-12);
      }),
    );
  });
});
