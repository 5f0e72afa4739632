import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hermitianEigen } from '../../src/linalg/hermitianEigen.js';
import { unitarityError } from '../../src/linalg/unitarityError.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { expectClose, expectComplexArrayClose } from '../helpers/close.js';
import { matMul, matrixFromRows } from '../helpers/complexMatrixOps.js';
import { randomHermitian, randomUnitary } from '../rotations/helpers/randomMatrices.js';

function scaledColumns(V: ComplexMatrix, values: Float64Array): ComplexMatrix {
  const n = V.n;
  return { n, re: V.re.map((x, e) => x * values[e % n]!), im: V.im.map((x, e) => x * values[e % n]!) };
}

describe('hermitianEigen(A)', () => {
  it('gives A V = V diag(ε), V unitary, ε ascending, for random complex Hermitian matrices up to 40×40', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), fc.integer(), (n, seed) => {
        const A = randomHermitian(n, seed);
        const { values, vectors } = hermitianEigen(A);
        expect(unitarityError(vectors)).toBeLessThan(1e-12);
        expectComplexArrayClose(matMul(A, vectors), scaledColumns(vectors, values), 1e-11, 'A V − V diag(ε)');
        for (let k = 1; k < n; k++) expect(values[k]!).toBeGreaterThanOrEqual(values[k - 1]!);
      }),
      { numRuns: 25 },
    );
  });

  it('finds the eigenvalues ±1 of the Pauli matrix Y (textbook)', () => {
    const { values } = hermitianEigen(matrixFromRows([[0, [0, -1]], [[0, 1], 0]]));
    expectClose(values[0]!, -1, 1e-15);
    expectClose(values[1]!, 1, 1e-15);
  });

  it('recovers a prescribed degenerate spectrum W diag(1, 1, 2, 2, 5) W†', () => {
    const W = randomUnitary(5, 3);
    const spectrum = Float64Array.from([1, 1, 2, 2, 5]);
    const Wd: ComplexMatrix = { n: 5, re: new Float64Array(25), im: new Float64Array(25) };
    for (let i = 0; i < 5; i++) for (let j = 0; j < 5; j++) [Wd.re[i * 5 + j], Wd.im[i * 5 + j]] = [W.re[j * 5 + i]!, -W.im[j * 5 + i]!];
    const { values, vectors } = hermitianEigen(matMul(scaledColumns(W, spectrum), Wd));
    values.forEach((v, k) => expectClose(v, spectrum[k]!, 1e-12, `ε_${k}`));
    expect(unitarityError(vectors)).toBeLessThan(1e-12);
  });

  it('handles the empty and the already diagonal matrix', () => {
    expect(hermitianEigen({ n: 0, re: new Float64Array(0), im: new Float64Array(0) }).values.length).toBe(0);
    const { values, vectors } = hermitianEigen(matrixFromRows([[3, 0], [0, -2]]));
    expect([...values]).toEqual([-2, 3]);
    expect([...vectors.re]).toEqual([0, 1, 1, 0]);
  });

  it('throws a RangeError for a non-Hermitian or non-finite matrix', () => {
    expect(() => hermitianEigen(matrixFromRows([[0, 1], [0, 0]]))).toThrow(/hermitianEigen: matrix is not Hermitian/);
    expect(() => hermitianEigen(matrixFromRows([[Number.POSITIVE_INFINITY]]))).toThrow(RangeError);
  });
});
