import { describe, expect, it } from 'vitest';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { fermionProduct } from '../../src/operators/fermionProduct.js';
import { ladder } from '../../src/operators/ladder.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';

describe('ladderSumMatrix(op, modes)', () => {
  // CONVENTIONS.md: a_j = Z_0…Z_{j−1}(X_j + iY_j)/2, basis index bit j = mode j occupied.
  it('gives a_0 on one mode as |0><1|', () => {
    expectComplexArrayClose(ladderSumMatrix(ladder(0, false), 1), matrixFromRows([[0, 1], [0, 0]]), 0);
  });

  it('gives a_1 on two modes the Jordan–Wigner sign of an occupied mode 0', () => {
    // a_1 = Z_0 ⊗ |0><1|_1: |10> (index 2) → |00>, |11> (index 3) → −|01> (index 1).
    const expected = matrixFromRows([
      [0, 0, 1, 0],
      [0, 0, 0, -1],
      [0, 0, 0, 0],
      [0, 0, 0, 0],
    ]);
    expectComplexArrayClose(ladderSumMatrix(ladder(1, false), 2), expected, 0);
  });

  it('gives the number operator a†_j a_j as the diagonal of bit j', () => {
    const m = ladderSumMatrix(fermionProduct([{ mode: 1, dagger: true }, { mode: 1, dagger: false }], 2, 1), 3);
    for (let r = 0; r < 8; r++) {
      for (let c = 0; c < 8; c++) {
        const expected = r === c && (c & 2) !== 0 ? [2, 1] : [0, 0];
        expect([m.re[r * 8 + c], m.im[r * 8 + c]]).toEqual(expected);
      }
    }
  });

  it('gives the identity for a product with no factors', () => {
    const m = ladderSumMatrix(fermionProduct([], 3), 2);
    expectComplexArrayClose(m, matrixFromRows([[3, 0, 0, 0], [0, 3, 0, 0], [0, 0, 3, 0], [0, 0, 0, 3]]), 0);
  });

  it('refuses more than 12 modes and modes beyond the register', () => {
    expect(() => ladderSumMatrix(ladder(0, true), 13)).toThrow(RangeError);
    expect(() => ladderSumMatrix(ladder(3, true), 3)).toThrow(RangeError);
  });
});
