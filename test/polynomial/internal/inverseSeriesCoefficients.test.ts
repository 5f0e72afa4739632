import { describe, expect, it } from 'vitest';
import { evaluateChebyshev } from '../../../src/polynomial/evaluateChebyshev.js';
import { inverseSeriesCoefficients, inverseSeriesRounding } from '../../../src/polynomial/internal/inverseSeriesCoefficients.js';
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

  it('is within its stated rounding bound of the exact coefficients, from exact binomial sums in integer arithmetic', () => {
    // c_{2j+1} = 4 Σ_{i>j} C(2b, b+i) / 4^b (the same expansion), evaluated with BigInt and divided to ~80 bits.
    for (const b of [30, 700, 2001]) {
      const degree = 2 * b - 1;
      const computed = inverseSeriesCoefficients(b, degree);
      const { common, relative } = inverseSeriesRounding(b);
      const binomials: bigint[] = [1n];
      for (let k = 1; k <= 2 * b; k++) binomials.push((binomials[k - 1]! * BigInt(2 * b - k + 1)) / BigInt(k));
      const denominator = 4n ** BigInt(b);
      let tail = 0n;
      let worst = 0;
      for (let j = b - 1; j >= 0; j--) {
        tail += binomials[b + j + 1]!;
        if (tail === 0n) continue;
        const shift = BigInt(Math.max(0, 80 - (tail.toString(2).length - denominator.toString(2).length)));
        const exact = (4 * Number((tail << shift) / denominator)) / 2 ** Number(shift);
        if (exact < 1e-280) continue;
        const sign = j % 2 === 0 ? 1 : -1;
        worst = Math.max(worst, Math.abs(computed[2 * j + 1]! - sign * exact) / exact);
      }
      // The reference itself is rounded once to double: one more 2⁻⁵³.
      expect(worst, `b = ${b}`).toBeLessThanOrEqual(common + relative + 2 ** -53);
    }
  });

  it('refuses a non-positive b', () => {
    expect(() => inverseSeriesCoefficients(0, 3)).toThrow(/b must be a positive integer, got 0/);
  });
});
