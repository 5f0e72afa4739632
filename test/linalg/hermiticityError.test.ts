import { describe, expect, it } from 'vitest';
import { hermiticityError } from '../../src/linalg/hermiticityError.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';

describe('hermiticityError(a)', () => {
  it('is 0 for Hermitian matrices and max |a_ij − conj(a_ji)| otherwise', () => {
    expect(hermiticityError(matrixFromRows([[1, [2, 3]], [[2, -3], 4]]))).toBe(0);
    expect(hermiticityError(matrixFromRows([[[0, 1], 0], [0, 0]]))).toBe(2);
    expect(hermiticityError(matrixFromRows([[0, 3], [1, 0]]))).toBe(2);
  });
});
