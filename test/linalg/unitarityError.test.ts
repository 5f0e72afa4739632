import { describe, expect, it } from 'vitest';
import { unitarityError } from '../../src/linalg/unitarityError.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';
import { randomUnitary } from '../rotations/helpers/randomMatrices.js';

describe('unitarityError(a)', () => {
  it('is ~0 for unitaries and max |(a†a − I)_ij| otherwise', () => {
    expect(unitarityError(randomUnitary(7, 1))).toBeLessThan(1e-14);
    // a†a = [[1, 1], [1, 2]] for a = [[1, 1], [0, 1]].
    expect(unitarityError(matrixFromRows([[1, 1], [0, 1]]))).toBe(1);
    expect(unitarityError(matrixFromRows([[Number.NaN]]))).toBeNaN();
  });
});
