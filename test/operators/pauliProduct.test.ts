import { describe, expect, it } from 'vitest';
import { pauliProduct } from '../../src/operators/pauliProduct.js';

describe('pauliProduct(qubits, factors, re, im)', () => {
  it('encodes X as an x bit, Z as a z bit and Y as both', () => {
    const [t] = pauliProduct(300, [[0, 'X'], [2, 'Z'], [299, 'Y']], 2, -1).terms;
    expect(t).toEqual({ x: 1n | (1n << 299n), z: 4n | (1n << 299n), re: 2, im: -1 });
  });

  it('rejects a qubit outside the register or given twice', () => {
    expect(() => pauliProduct(2, [[2, 'X']])).toThrow(RangeError);
    expect(() => pauliProduct(2, [[1, 'X'], [1, 'Z']])).toThrow(RangeError);
  });
});
