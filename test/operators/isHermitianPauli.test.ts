import { describe, expect, it } from 'vitest';
import { addPauli } from '../../src/operators/addPauli.js';
import { isHermitianPauli } from '../../src/operators/isHermitianPauli.js';
import { pauliProduct } from '../../src/operators/pauliProduct.js';

describe('isHermitianPauli(sum, options)', () => {
  it('accepts real coefficients and rejects an imaginary one', () => {
    expect(isHermitianPauli(addPauli(pauliProduct(2, [[0, 'Y']], 2), pauliProduct(2, [], -1)))).toBe(true);
    expect(isHermitianPauli(pauliProduct(2, [[0, 'Y']], 0, 1))).toBe(false);
  });

  it('judges after combining strings, so cancelling imaginary parts pass', () => {
    expect(isHermitianPauli(addPauli(pauliProduct(1, [[0, 'X']], 1, 1), pauliProduct(1, [[0, 'X']], 0, -1)))).toBe(true);
  });

  it('uses the tolerance it is given', () => {
    const sum = pauliProduct(1, [[0, 'Z']], 1, 1e-9);
    expect(isHermitianPauli(sum)).toBe(false);
    expect(isHermitianPauli(sum, { tolerance: 1e-8 })).toBe(true);
  });
});
