import { describe, expect, it } from 'vitest';
import { measureSupNorm } from '../../src/polynomial/measureSupNorm.js';
import { expectClose } from '../helpers/close.js';

describe('measureSupNorm(p, points)', () => {
  it('gives |c| for c·T_k, whose maximum sits at x = ±1 (textbook)', () => {
    for (const k of [0, 1, 7, 50]) {
      const coefficients = new Float64Array(k + 1);
      coefficients[k] = -0.6;
      expectClose(measureSupNorm({ parity: 'none', coefficients }), 0.6, 1e-13, `T_${k}`);
    }
  });

  it('finds the interior maximum 2/(3√3) of x − x³ = (T_1 − T_3)/4 to grid accuracy, from below (calculus)', () => {
    const exact = 2 / (3 * Math.sqrt(3));
    const measured = measureSupNorm({ parity: 'odd', coefficients: Float64Array.from([0, 0.25, 0, -0.25]) });
    expect(measured).toBeLessThanOrEqual(exact + 1e-15);
    expectClose(measured, exact, 1e-3);
  });

  it('refuses a grid size that is not a positive integer', () => {
    expect(() => measureSupNorm({ parity: 'none', coefficients: Float64Array.from([1]) }, 0)).toThrow(/points must be a positive integer, got 0/);
  });
});
