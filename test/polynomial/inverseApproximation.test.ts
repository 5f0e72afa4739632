import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateChebyshev } from '../../src/polynomial/evaluateChebyshev.js';
import { inverseApproximation } from '../../src/polynomial/inverseApproximation.js';

/** max over an equally spaced grid of `count` points on δ ≤ |x| ≤ 1 of |p(x)/scale − 1/x|, and max |p| on [−1, 1]. */
function denseCheck(result: ReturnType<typeof inverseApproximation>, count: number): { inverseError: number; sup: number } {
  let inverseError = 0;
  let sup = 0;
  for (let l = 0; l < count; l++) {
    const x = result.delta + ((1 - result.delta) * l) / (count - 1);
    for (const signed of [x, -x]) inverseError = Math.max(inverseError, Math.abs(evaluateChebyshev(result.polynomial, signed) / result.scale - 1 / signed));
    sup = Math.max(sup, Math.abs(evaluateChebyshev(result.polynomial, -1 + (2 * l) / (count - 1))));
  }
  return { inverseError, sup };
}

describe('inverseApproximation(δ, ε)', () => {
  it('is odd, bounded by its sup-norm target, and within ε of 1/x on an independent dense grid', () => {
    for (const [delta, epsilon] of [[0.2, 1e-2], [0.1, 1e-6], [0.03, 1e-9]] as const) {
      const result = inverseApproximation(delta, epsilon);
      expect(result.polynomial.parity).toBe('odd');
      for (let k = 0; k < result.polynomial.coefficients.length; k += 2) expect(result.polynomial.coefficients[k]).toBe(0);
      expect(result.polynomial.coefficients.length).toBe(result.degree + 1);
      expect(result.degree % 2).toBe(1);
      expect(result.scale).toBeLessThanOrEqual(delta);
      expect(result.maxError).toBeLessThanOrEqual(epsilon * result.scale);
      expect(result.supNorm).toBeLessThan(1);
      const { inverseError, sup } = denseCheck(result, 20_001);
      expect(inverseError).toBeLessThanOrEqual(epsilon);
      expect(sup).toBeLessThanOrEqual(0.5 * 1.01);
    }
  });

  it('never exceeds its certified errorBound: a dense grid refined around its largest errors by golden-section search', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 0.6, noNaN: true }), fc.double({ min: -10, max: -2, noNaN: true }), (delta, logEpsilon) => {
        const epsilon = 10 ** logEpsilon;
        const result = inverseApproximation(delta, epsilon);
        expect(result.maxError).toBeLessThanOrEqual(result.errorBound);
        expect(result.errorBound).toBeLessThanOrEqual(epsilon * result.scale);
        const error = (x: number): number => Math.abs(evaluateChebyshev(result.polynomial, x) - result.scale / x);
        const count = 40 * result.degree;
        const grid = Array.from({ length: count }, (_, l) => delta + ((1 - delta) * l) / (count - 1));
        const largest = grid.map((x, l) => ({ x, l, e: error(x) })).sort((a, b) => b.e - a.e).slice(0, 20);
        let worst = largest[0]!.e;
        for (const { l } of largest) {
          let lo = grid[Math.max(0, l - 1)]!;
          let hi = grid[Math.min(count - 1, l + 1)]!;
          for (let step = 0; step < 60; step++) {
            const a = hi - 0.618 * (hi - lo);
            const b = lo + 0.618 * (hi - lo);
            if (error(a) > error(b)) hi = b;
            else lo = a;
          }
          worst = Math.max(worst, error((lo + hi) / 2));
        }
        expect(worst).toBeLessThanOrEqual(result.errorBound);
      }),
      { numRuns: 25, seed: 5 },
    );
  });

  it('grows its degree like (1/δ)·log(1/ε): halving δ about doubles it, squaring ε raises it by well under 2× (Childs, Kothari & Somma 2017)', () => {
    const base = inverseApproximation(0.08, 1e-6).degree;
    const halfDelta = inverseApproximation(0.04, 1e-6).degree;
    const squaredEpsilon = inverseApproximation(0.08, 1e-12).degree;
    expect(halfDelta / base).toBeGreaterThan(1.7);
    expect(halfDelta / base).toBeLessThan(2.4);
    expect(squaredEpsilon / base).toBeGreaterThan(1.2);
    expect(squaredEpsilon / base).toBeLessThan(2.1);
  });

  it('chooses the smallest degree whose certified bound meets ε: the next lower odd degree is refused', () => {
    const result = inverseApproximation(0.1, 1e-4);
    expect(() => inverseApproximation(0.1, 1e-4, { maxDegree: result.degree - 2 })).toThrow(/beyond maxDegree/);
    expect(inverseApproximation(0.1, 1e-4, { maxDegree: result.degree }).degree).toBe(result.degree);
  });

  it('meets a smaller sup-norm target by a smaller scale', () => {
    const result = inverseApproximation(0.1, 1e-4, { supTarget: 0.25 });
    expect(result.supNorm).toBeCloseTo(0.25, 12);
    expect(result.scale).toBeCloseTo(inverseApproximation(0.1, 1e-4).scale / 2, 12);
  });

  it('refuses δ or ε outside (0, 1), a bad supTarget, and a degree beyond maxDegree, naming the value', () => {
    expect(() => inverseApproximation(0, 1e-3)).toThrow(/delta must be in \(0, 1\), got 0/);
    expect(() => inverseApproximation(-0.1, 1e-3)).toThrow(/got -0.1/);
    expect(() => inverseApproximation(1, 1e-3)).toThrow(/delta must be in \(0, 1\), got 1/);
    expect(() => inverseApproximation(Number.NaN, 1e-3)).toThrow(/got NaN/);
    expect(() => inverseApproximation(0.1, 1)).toThrow(/epsilon must be in \(0, 1\), got 1/);
    expect(() => inverseApproximation(0.1, 0)).toThrow(/epsilon must be in \(0, 1\), got 0/);
    expect(() => inverseApproximation(0.1, 1e-3, { supTarget: 1 })).toThrow(/supTarget must be in \(0, 1\), got 1/);
    expect(() => inverseApproximation(0.01, 1e-6, { maxDegree: 100 })).toThrow(/beyond maxDegree = 100/);
  });
});
