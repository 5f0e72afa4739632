import { describe, expect, it } from 'vitest';
import { addPauli } from '../../src/operators/addPauli.js';
import { pauliOneNorm } from '../../src/operators/pauliOneNorm.js';
import { pauliProduct } from '../../src/operators/pauliProduct.js';

describe('pauliOneNorm(sum)', () => {
  it('sums |c| over combined strings, identity included', () => {
    const sum = addPauli(pauliProduct(2, [], -1), pauliProduct(2, [[0, 'X']], 3, 4), pauliProduct(2, [[1, 'Z']], 1),
      pauliProduct(2, [[1, 'Z']], -1));
    expect(pauliOneNorm(sum)).toBe(1 + 5);
  });
});
