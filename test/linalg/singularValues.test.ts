import fc from 'fast-check';
import { complex, ctranspose, eigs, matrix, multiply, type Complex as MathComplex } from 'mathjs';
import { describe, expect, it } from 'vitest';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { singularValueDecomposition } from '../../src/linalg/singularValues.js';
import { matrixFunctionOfSingularValues } from '../../src/linalg/singularValueTransform.js';
import { unitarityError } from '../../src/linalg/unitarityError.js';
import { expectClose, expectComplexArrayClose } from '../helpers/close.js';
import { conjTranspose, matMul, matrixFromRows } from '../helpers/complexMatrixOps.js';
import { randomComplexGaussian, randomHermitian } from '../rotations/helpers/randomMatrices.js';

/** U diag(values) V†. */
function recompose(U: ComplexMatrix, values: Float64Array, V: ComplexMatrix): ComplexMatrix {
  const n = U.n;
  const scaled = { n, re: U.re.map((x, e) => x * values[e % n]!), im: U.im.map((x, e) => x * values[e % n]!) };
  return matMul(scaled, conjTranspose(V));
}

/** Eigenvalues of M†M by mathjs, ascending (an independent reference for σ²). */
function gramEigenvalues(M: ComplexMatrix): number[] {
  const n = M.n;
  const rows = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => complex(M.re[i * n + j]!, M.im[i * n + j]!)));
  const m = matrix(rows);
  const gram = multiply(ctranspose(m), m);
  const values = eigs(gram).values as unknown as { toArray(): (number | MathComplex)[] };
  return values.toArray().map((v) => (typeof v === 'number' ? v : v.re)).sort((a, b) => a - b);
}

function maxAbs(M: ComplexMatrix): number {
  let largest = 0;
  for (let e = 0; e < M.re.length; e++) largest = Math.max(largest, Math.hypot(M.re[e]!, M.im[e]!));
  return largest;
}

describe('singularValueDecomposition(M)', () => {
  it('gives σ² = the eigenvalues of M†M (mathjs eigs), M = U diag(σ) V†, U and V unitary, σ descending, for random complex matrices up to 10×10', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10 }), fc.integer(), (n, seed) => {
        const M = randomComplexGaussian(n, seed);
        const { U, sigma, V } = singularValueDecomposition(M);
        for (let k = 1; k < n; k++) expect(sigma[k]!).toBeLessThanOrEqual(sigma[k - 1]!);
        expect(sigma[n - 1]!).toBeGreaterThanOrEqual(0);
        const reference = gramEigenvalues(M).reverse();
        sigma.forEach((s, k) => expectClose(s * s, reference[k]!, 1e-10 * sigma[0]! ** 2, `σ_${k}²`));
        expect(unitarityError(U)).toBeLessThan(1e-12);
        expect(unitarityError(V)).toBeLessThan(1e-12);
        expectComplexArrayClose(recompose(U, sigma, V), M, 1e-12 * Math.max(1, sigma[0]!), 'U diag(σ) V† − M');
      }),
      { numRuns: 20 },
    );
  });

  it('decomposes a 128×128 random matrix to rounding level', () => {
    const M = randomComplexGaussian(128, 11);
    const { U, sigma, V } = singularValueDecomposition(M);
    expect(unitarityError(U)).toBeLessThan(1e-12);
    expect(unitarityError(V)).toBeLessThan(1e-12);
    expectComplexArrayClose(recompose(U, sigma, V), M, 1e-12 * sigma[0]!, 'U diag(σ) V† − M');
  });

  it('gives σ = sorted |d_k| for a diagonal matrix with complex entries (textbook)', () => {
    const { sigma } = singularValueDecomposition(matrixFromRows([[[0, -2], 0, 0], [0, 0.5, 0], [0, 0, [3, 4]]]));
    [5, 2, 0.5].forEach((s, k) => expectClose(sigma[k]!, s, 1e-15, `σ_${k}`));
  });

  it('handles rank deficiency: u v† has σ = (‖u‖‖v‖, 0, …) and unitary U, V; the zero matrix gives unitary factors too', () => {
    const u = [[1, 2], [0, -1], [3, 0], [0.5, 0.5], [0, 0]] as const;
    const v = [[2, 0], [1, 1], [0, -1], [0, 0], [1, 0]] as const;
    const n = 5;
    const M: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        // u_i conj(v_j)
        M.re[i * n + j] = u[i]![0] * v[j]![0] + u[i]![1] * v[j]![1];
        M.im[i * n + j] = u[i]![1] * v[j]![0] - u[i]![0] * v[j]![1];
      }
    }
    const norm = (w: typeof u | typeof v): number => Math.sqrt(w.reduce((s, [a, b]) => s + a * a + b * b, 0));
    const { U, sigma, V } = singularValueDecomposition(M);
    expectClose(sigma[0]!, norm(u) * norm(v), 1e-14);
    for (let k = 1; k < n; k++) expect(sigma[k]!).toBeLessThan(1e-14);
    expect(unitarityError(U)).toBeLessThan(1e-12);
    expect(unitarityError(V)).toBeLessThan(1e-12);
    expectComplexArrayClose(recompose(U, sigma, V), M, 1e-13, 'reconstruction');
    const zero = singularValueDecomposition({ n: 3, re: new Float64Array(9), im: new Float64Array(9) });
    expect([...zero.sigma]).toEqual([0, 0, 0]);
    expect(unitarityError(zero.U)).toBeLessThan(1e-15);
  });

  it('refuses non-finite entries', () => {
    expect(() => singularValueDecomposition(matrixFromRows([[1, Number.NaN], [0, 1]]))).toThrow(/entry \(0, 1\) is not finite/);
  });
});

describe('matrixFunctionOfSingularValues(M, f)', () => {
  it('gives M M† M for f(σ) = σ³ (U Σ³ V† = (U Σ V†)(V Σ U†)(U Σ V†))', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10 }), fc.integer(), (n, seed) => {
        const M = randomComplexGaussian(n, seed);
        const expected = matMul(matMul(M, conjTranspose(M)), M);
        expectComplexArrayClose(matrixFunctionOfSingularValues(M, (s) => s ** 3), expected, 1e-11 * maxAbs(expected), 'U Σ³ V†');
      }),
      { numRuns: 30 },
    );
  });

  it('equals the eigenvalue function f(A) for an odd f and Hermitian A (Gilyén, Su, Low & Wiebe, STOC 2019: odd singular value transforms of Hermitian matrices)', () => {
    const A = randomHermitian(6, 4);
    const expected = matMul(matMul(A, A), A);
    const odd = (s: number): number => s ** 3;
    expectComplexArrayClose(matrixFunctionOfSingularValues(A, odd), expected, 1e-11 * maxAbs(expected), 'A³');
  });

  it('gives a unitary matrix (the polar factor U V†) for f ≡ 1', () => {
    const M = randomComplexGaussian(7, 9);
    expect(unitarityError(matrixFunctionOfSingularValues(M, () => 1))).toBeLessThan(1e-13);
  });
});
