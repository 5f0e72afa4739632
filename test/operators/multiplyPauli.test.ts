import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { multiplyPauli } from '../../src/operators/multiplyPauli.js';
import { pauliProduct } from '../../src/operators/pauliProduct.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { matMul } from '../helpers/complexMatrixOps.js';
import { pauliSumArb } from '../helpers/operatorArbitraries.js';

describe('multiplyPauli(a, b)', () => {
  // XY = iZ, YZ = iX, ZX = iY and the reversed products carry −i (common practice).
  it('reproduces the single-qubit Pauli product table', () => {
    const p = (label: 'X' | 'Y' | 'Z') => pauliProduct(1, [[0, label]]);
    expect(multiplyPauli(p('X'), p('Y')).terms).toEqual(pauliProduct(1, [[0, 'Z']], 0, 1).terms);
    expect(multiplyPauli(p('Y'), p('Z')).terms).toEqual(pauliProduct(1, [[0, 'X']], 0, 1).terms);
    expect(multiplyPauli(p('Z'), p('X')).terms).toEqual(pauliProduct(1, [[0, 'Y']], 0, 1).terms);
    expect(multiplyPauli(p('Y'), p('X')).terms).toEqual(pauliProduct(1, [[0, 'Z']], 0, -1).terms);
    expect(multiplyPauli(p('Y'), p('Y')).terms).toEqual(pauliProduct(1, []).terms);
  });

  it('gets phases right far beyond 53 bits', () => {
    // (X_200 Y_250)(Y_200 Y_250) = (XY)_200 (YY)_250 = i Z_200.
    const a = pauliProduct(256, [[200, 'X'], [250, 'Y']]);
    const b = pauliProduct(256, [[200, 'Y'], [250, 'Y']]);
    expect(multiplyPauli(a, b).terms).toEqual(pauliProduct(256, [[200, 'Z']], 0, 1).terms);
  });

  it('matches the product of the dense matrices', () => {
    fc.assert(
      fc.property(pauliSumArb(3), pauliSumArb(3), (a, b) => {
        expectComplexArrayClose(pauliSumMatrix(multiplyPauli(a, b)), matMul(pauliSumMatrix(a), pauliSumMatrix(b)), 1e-12);
      }),
      { numRuns: 200 },
    );
  });

  it('removes terms that cancel exactly', () => {
    // X·Z + Z·X = −iY + iY = 0
    const sum = { qubits: 1, terms: [...pauliProduct(1, [[0, 'X']]).terms, ...pauliProduct(1, [[0, 'Z']]).terms] };
    const square = multiplyPauli(sum, sum);
    expect(square.terms).toEqual(pauliProduct(1, [], 2).terms);
  });
});
