import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addPauli } from '../../src/operators/addPauli.js';
import { pauliProduct } from '../../src/operators/pauliProduct.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { scalePauli } from '../../src/operators/scalePauli.js';
import { simplifyPauli } from '../../src/operators/simplifyPauli.js';
import { expectComplexArrayClose } from '../helpers/close.js';
import { pauliSumArb } from '../helpers/operatorArbitraries.js';

describe('simplifyPauli(sum, options)', () => {
  it('combines equal strings and drops exact zeros', () => {
    const zx = pauliProduct(2, [[0, 'Z'], [1, 'X']]);
    const sum = addPauli(zx, scalePauli(zx, -1), pauliProduct(2, [[1, 'Y']], 1, 1), pauliProduct(2, [[1, 'Y']], 1));
    expect(simplifyPauli(sum).terms).toEqual(pauliProduct(2, [[1, 'Y']], 2, 1).terms);
  });

  it('drops terms at or below the tolerance when one is given', () => {
    const sum = addPauli(pauliProduct(1, [[0, 'X']], 1e-14), pauliProduct(1, [[0, 'Z']], 1));
    expect(simplifyPauli(sum).terms).toHaveLength(2);
    expect(simplifyPauli(sum, { tolerance: 1e-12 }).terms).toEqual(pauliProduct(1, [[0, 'Z']]).terms);
  });

  it('keeps the matrix and leaves no repeated string', () => {
    fc.assert(
      fc.property(pauliSumArb(2, 8), (sum) => {
        const simple = simplifyPauli(sum);
        expectComplexArrayClose(pauliSumMatrix(simple), pauliSumMatrix(sum), 1e-12);
        const keys = simple.terms.map((t) => `${t.x}:${t.z}`);
        expect(new Set(keys).size).toBe(keys.length);
      }),
    );
  });
});
