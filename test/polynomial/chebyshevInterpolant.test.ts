import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { chebyshevInterpolant } from '../../src/polynomial/chebyshevInterpolant.js';
import { evaluateChebyshev } from '../../src/polynomial/evaluateChebyshev.js';
import { expectClose } from '../helpers/close.js';

describe('chebyshevInterpolant(f, degree, parity)', () => {
  it('reproduces the coefficients of any Chebyshev series of degree ≤ the requested degree', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1, max: 1, noNaN: true }), { minLength: 1, maxLength: 40 }), fc.integer({ min: 0, max: 20 }), (c, extra) => {
        const series = { parity: 'none' as const, coefficients: Float64Array.from(c) };
        const fit = chebyshevInterpolant((x) => evaluateChebyshev(series, x), c.length - 1 + extra);
        fit.coefficients.forEach((v, k) => expectClose(v, c[k] ?? 0, 1e-13, `c_${k}`));
      }),
      { numRuns: 50 },
    );
  });

  it('finds e^x = I_0(1) + 2 Σ I_k(1) T_k(x) (Trefethen, ATAP ch. 3; I_0(1), I_1(1), I_2(1) from Abramowitz & Stegun Table 9.8, from memory)', () => {
    const fit = chebyshevInterpolant(Math.exp, 20);
    expectClose(fit.coefficients[0]!, 1.2660658777520082, 1e-14, 'I_0(1)');
    expectClose(fit.coefficients[1]!, 2 * 0.5651591039924851, 1e-14, '2 I_1(1)');
    expectClose(fit.coefficients[2]!, 2 * 0.1357476697670383, 1e-14, '2 I_2(1)');
    for (const x of [-1, -0.3, 0.2, 0.99]) expectClose(evaluateChebyshev(fit, x), Math.exp(x), 1e-14, `e^${x}`);
  });

  it('fits an odd (even) function with parity odd (even), the other coefficients exactly 0', () => {
    const odd = chebyshevInterpolant(Math.sinh, 15, 'odd');
    const even = chebyshevInterpolant(Math.cosh, 16, 'even');
    for (let k = 0; k <= 15; k++) expect(k % 2 === 0 ? odd.coefficients[k] : even.coefficients[k]).toBe(0);
    expect(odd.parity).toBe('odd');
    expectClose(evaluateChebyshev(odd, -0.4), Math.sinh(-0.4), 1e-14, 'sinh');
    expectClose(evaluateChebyshev(even, -0.4), Math.cosh(-0.4), 1e-14, 'cosh');
  });

  it('with a parity, uses f on x > 0 only: exp fitted as odd is the fit of sign(x)·e^{|x|}', () => {
    const fromHalf = chebyshevInterpolant(Math.exp, 31, 'odd');
    const extended = chebyshevInterpolant((x) => Math.sign(x) * Math.exp(Math.abs(x)), 31);
    fromHalf.coefficients.forEach((c, k) => expectClose(c, extended.coefficients[k]!, 1e-14, `c_${k}`));
  });

  it('refuses a negative degree and a non-finite sample', () => {
    expect(() => chebyshevInterpolant(Math.exp, -1)).toThrow(/degree must be a non-negative integer, got -1/);
    expect(() => chebyshevInterpolant((x) => 1 / x, 4, 'odd')).not.toThrow();
    expect(() => chebyshevInterpolant(() => Number.NaN, 4)).toThrow(RangeError);
  });
});
