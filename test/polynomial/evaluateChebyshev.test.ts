import fc from 'fast-check';
import { describe, it } from 'vitest';
import { evaluateChebyshev } from '../../src/polynomial/evaluateChebyshev.js';
import { expectClose } from '../helpers/close.js';

describe('evaluateChebyshev(p, x)', () => {
  it('gives T_k(cos θ) = cos(kθ) for a single Chebyshev polynomial (textbook definition of T_k)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 300 }), fc.double({ min: 0, max: Math.PI, noNaN: true }), (k, theta) => {
        const coefficients = new Float64Array(k + 1);
        coefficients[k] = 1;
        // cos θ is rounded before T_k sees it, and |T_k'| ≤ k², so agreement is to about k²·ε.
        expectClose(evaluateChebyshev({ parity: 'none', coefficients }, Math.cos(theta)), Math.cos(k * theta), 1e-14 + 1e-15 * k * k, `T_${k}`);
      }),
    );
  });

  it('is linear: Σ c_k cos(kθ) for random coefficients (textbook definition of T_k)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 1, maxLength: 60 }), fc.double({ min: 0, max: Math.PI, noNaN: true }), (c, theta) => {
        const expected = c.reduce((sum, ck, k) => sum + ck * Math.cos(k * theta), 0);
        expectClose(evaluateChebyshev({ parity: 'none', coefficients: Float64Array.from(c) }, Math.cos(theta)), expected, 1e-12);
      }),
    );
  });

  it('gives 0 for the empty series and x³ = (3T_1 + T_3)/4 at x = 0.7 (textbook identity)', () => {
    expectClose(evaluateChebyshev({ parity: 'none', coefficients: new Float64Array(0) }, 0.3), 0, 0);
    expectClose(evaluateChebyshev({ parity: 'odd', coefficients: Float64Array.from([0, 0.75, 0, 0.25]) }, 0.7), 0.343, 1e-15);
  });
});
