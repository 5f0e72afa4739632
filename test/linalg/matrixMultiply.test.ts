import { describe, expect, it } from 'vitest';
import { matrixMultiply } from '../../src/linalg/matrixMultiply.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';

describe('matrixMultiply(a, b)', () => {
  it('multiplies complex matrices: (iσx)(σz) = [[0, −i], [i, 0]] = σy', () => {
    const iX = matrixFromRows([[0, [0, 1]], [[0, 1], 0]]);
    const Z = matrixFromRows([[1, 0], [0, -1]]);
    expectComplexArrayClose(matrixMultiply(iX, Z), matrixFromRows([[0, [0, -1]], [[0, 1], 0]]), 0);
  });

  it('throws a RangeError for different sizes', () => {
    expect(() => matrixMultiply(matrixFromRows([[1]]), matrixFromRows([[1, 0], [0, 1]]))).toThrow(/matrixMultiply/);
  });
});
