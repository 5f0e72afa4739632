import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { unitarityError } from '../../src/linalg/unitarityError.js';
import { diagonalizeOneBody } from '../../src/rotations/diagonalizeOneBody.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { conjTranspose, matMul, matrixFromRows } from '../helpers/complexMatrixOps.js';
import { randomHermitian } from './helpers/randomMatrices.js';

describe('diagonalizeOneBody(T)', () => {
  it('returns ascending energies and unitary V with T = V diag(ε) V†', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }), fc.integer(), (n, seed) => {
        const T = randomHermitian(n, seed);
        const { energies, V } = diagonalizeOneBody(T);
        expect(unitarityError(V)).toBeLessThan(1e-12);
        const scaled = { n, re: V.re.map((x, e) => x * energies[e % n]!), im: V.im.map((x, e) => x * energies[e % n]!) };
        expectComplexArrayClose(matMul(scaled, conjTranspose(V)), T, 1e-12);
        for (let k = 1; k < n; k++) expect(energies[k]!).toBeGreaterThanOrEqual(energies[k - 1]!);
      }),
      { numRuns: 30 },
    );
  });

  it('throws RangeErrors naming itself for non-Hermitian, non-square or non-finite T', () => {
    expect(() => diagonalizeOneBody(matrixFromRows([[0, 1], [2, 0]]))).toThrow(/diagonalizeOneBody: T is not Hermitian/);
    expect(() => diagonalizeOneBody({ n: 2, re: new Float64Array(2), im: new Float64Array(4) })).toThrow(/diagonalizeOneBody: T must be a square/);
    expect(() => diagonalizeOneBody(matrixFromRows([[Number.NaN]]))).toThrow(/diagonalizeOneBody: T has non-finite/);
  });
});
