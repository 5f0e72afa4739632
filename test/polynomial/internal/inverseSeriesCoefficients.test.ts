import { describe, expect, it } from 'vitest';
import { evaluateChebyshev } from '../../../src/polynomial/evaluateChebyshev.js';
import { inverseSeriesCoefficients } from '../../../src/polynomial/internal/inverseSeriesCoefficients.js';
import { expectClose } from '../../helpers/close.js';

describe('inverseSeriesCoefficients(b, degree)', () => {
  it('sums, untruncated, to (1 − (1 − x²)^b)/x (Childs, Kothari & Somma 2017, Lemma 14 of arXiv:1511.02306)', () => {
    for (const b of [1, 2, 7, 40, 2500]) {
      const series = { parity: 'odd' as const, coefficients: inverseSeriesCoefficients(b, 2 * b - 1) };
      for (const x of [-0.9, -0.05, 0.001, 0.3, 1]) {
        expectClose(evaluateChebyshev(series, x), -Math.expm1(b * Math.log1p(-x * x)) / x, 1e-12, `b = ${b}, x = ${x}`);
      }
    }
  });

  it('has zero even coefficients and the alternating signs of the expansion', () => {
    const c = inverseSeriesCoefficients(30, 21);
    for (let k = 0; k <= 21; k += 2) expect(c[k]).toBe(0);
    for (let j = 0; 2 * j + 1 <= 21; j++) expect(Math.sign(c[2 * j + 1]!)).toBe(j % 2 === 0 ? 1 : -1);
  });

  it('refuses a non-positive b', () => {
    expect(() => inverseSeriesCoefficients(0, 3)).toThrow(/b must be a positive integer, got 0/);
  });
});
