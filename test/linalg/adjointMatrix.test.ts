import { describe, it } from 'vitest';
import { adjointMatrix } from '../../src/linalg/adjointMatrix.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';

describe('adjointMatrix(a)', () => {
  it('transposes and conjugates', () => {
    const a = matrixFromRows([[1, [2, 3]], [[4, -5], 6]]);
    expectComplexArrayClose(adjointMatrix(a), matrixFromRows([[1, [4, 5]], [[2, -3], 6]]), 0);
  });
});
