import { describe, expect, it } from 'vitest';
import { pauliProduct } from '../../src/operators/pauliProduct.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matrixFromRows } from '../helpers/complexMatrixOps.js';

describe('pauliSumMatrix(sum)', () => {
  // Pauli matrices X = [[0,1],[1,0]], Y = [[0,−i],[i,0]], Z = diag(1,−1) (common practice).
  it('gives the standard single-qubit Pauli matrices', () => {
    expectComplexArrayClose(pauliSumMatrix(pauliProduct(1, [[0, 'X']])), matrixFromRows([[0, 1], [1, 0]]), 0);
    expectComplexArrayClose(pauliSumMatrix(pauliProduct(1, [[0, 'Y']])), matrixFromRows([[0, [0, -1]], [[0, 1], 0]]), 0);
    expectComplexArrayClose(pauliSumMatrix(pauliProduct(1, [[0, 'Z']])), matrixFromRows([[1, 0], [0, -1]]), 0);
  });

  it('puts qubit q on bit q of the basis index (little-endian)', () => {
    // X on qubit 1 of two qubits flips bit 1: |0> ↔ |2>, |1> ↔ |3>.
    const expected = matrixFromRows([
      [0, 0, 1, 0],
      [0, 0, 0, 1],
      [1, 0, 0, 0],
      [0, 1, 0, 0],
    ]);
    expectComplexArrayClose(pauliSumMatrix(pauliProduct(2, [[1, 'X']])), expected, 0);
  });

  it('sums terms with their complex coefficients', () => {
    const sum = { qubits: 1, terms: [...pauliProduct(1, [], 0.5).terms, ...pauliProduct(1, [[0, 'Z']], 0, 2).terms] };
    expectComplexArrayClose(pauliSumMatrix(sum), matrixFromRows([[[0.5, 2], 0], [0, [0.5, -2]]]), 0);
  });

  it('refuses more than 12 qubits', () => {
    expect(() => pauliSumMatrix(pauliProduct(13, []))).toThrow(RangeError);
  });
});
