import { describe, it } from 'vitest';
import { fermionicSwap } from '../../src/rotations/fermionicSwap.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { conjTranspose, matMul, matrixFromRows } from '../helpers/complexMatrixOps.js';
import { creationMatrix } from './helpers/fockOperators.js';
import { blockUnitary } from './helpers/simulateBlock.js';

describe('fermionicSwap (fermionic_swap)', () => {
  it('swaps |01> and |10> and gives |11> the exchange sign (Verstraete, Cirac & Latorre, PRA 79, 032316, 2009)', () => {
    const expected = matrixFromRows([
      [1, 0, 0, 0],
      [0, 0, 1, 0],
      [0, 1, 0, 0],
      [0, 0, 0, -1],
    ]);
    expectComplexArrayClose(blockUnitary(fermionicSwap), expected, 0);
  });

  it('exchanges a_0† and a_1† under conjugation (one-particle matrix = the swap)', () => {
    const U = blockUnitary(fermionicSwap);
    expectComplexArrayClose(matMul(conjTranspose(U), matMul(creationMatrix(2, 0), U)), creationMatrix(2, 1), 1e-15);
    expectComplexArrayClose(matMul(conjTranspose(U), matMul(creationMatrix(2, 1), U)), creationMatrix(2, 0), 1e-15);
  });
});
