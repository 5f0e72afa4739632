import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { seededRandom } from '../../src/core/seededRandom.js';
import type { ChebyshevSeries } from '../../src/polynomial/ChebyshevSeries.js';
import { evaluateChebyshev } from '../../src/polynomial/evaluateChebyshev.js';
import { inverseApproximation } from '../../src/polynomial/inverseApproximation.js';
import { measureSupNorm } from '../../src/polynomial/measureSupNorm.js';
import { qspMatrixElement, qspPhases } from '../../src/polynomial/qspPhases.js';
import { expectClose } from '../helpers/close.js';

/** A random real series of the given parity and degree, scaled to a measured sup-norm `sup`. */
function randomTarget(degree: number, seed: number, sup: number): ChebyshevSeries {
  const random = seededRandom(seed);
  const coefficients = new Float64Array(degree + 1);
  // Slowly decaying random coefficients, the top one nonzero.
  for (let k = degree % 2; k <= degree; k += 2) coefficients[k] = (2 * random.next() - 1) / (1 + k / 10) + (k === degree ? 0.05 : 0);
  const scale = sup / measureSupNorm({ parity: 'none', coefficients });
  return { parity: degree % 2 === 0 ? 'even' : 'odd', coefficients: coefficients.map((c) => c * scale) };
}

/** max |Re⟨0|U(x)|0⟩ − p(x)| by the direct product, over `count` equally spaced points of [−1, 1]. */
function directError(phases: Float64Array, target: ChebyshevSeries, count: number): number {
  let largest = 0;
  for (let l = 0; l < count; l++) {
    const x = -1 + (2 * l) / (count - 1);
    largest = Math.max(largest, Math.abs(qspMatrixElement(phases, x).re - evaluateChebyshev(target, x)));
  }
  return largest;
}

describe('qspMatrixElement(phases, x)', () => {
  it('gives ⟨0|W(x)^d|0⟩ = T_d(x) for all phases zero (Gilyén, Su, Low & Wiebe, STOC 2019; Martyn, Rossi, Tan & Chuang, PRX Quantum 2, 040203, 2021)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 400 }), fc.double({ min: 0, max: Math.PI, noNaN: true }), (d, theta) => {
        const { re, im } = qspMatrixElement(new Float64Array(d + 1), Math.cos(theta));
        expectClose(re, Math.cos(d * theta), 1e-14 + 1e-15 * d * d, `T_${d}`);
        expectClose(im, 0, 1e-14, 'imaginary part');
      }),
    );
  });

  it('gives x e^{i(φ0+φ1)} for one W between two phases (2×2 product by hand)', () => {
    const { re, im } = qspMatrixElement(Float64Array.from([0.3, 0.4]), 0.6);
    expectClose(re, 0.6 * Math.cos(0.7), 1e-15);
    expectClose(im, 0.6 * Math.sin(0.7), 1e-15);
  });

  it('refuses an empty phase list and x outside [−1, 1]', () => {
    expect(() => qspMatrixElement(new Float64Array(0), 0)).toThrow(RangeError);
    expect(() => qspMatrixElement(new Float64Array(2), 1.5)).toThrow(/x must be in \[−1, 1\], got 1.5/);
  });
});

describe('qspPhases(target)', () => {
  it('reproduces random targets of definite parity, degree ≤ 200, sup-norm ≤ 0.9, to 1e-12 by the direct product, with symmetric phases and an honest residual', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 200 }), fc.integer(), fc.double({ min: 0.05, max: 0.9, noNaN: true }), (degree, seed, sup) => {
        const target = randomTarget(degree, seed, sup);
        const result = qspPhases(target);
        expect(result.convention).toBe('wx');
        expect(result.phases.length).toBe(degree + 1);
        for (let k = 0; k <= degree; k++) expect(result.phases[k]).toBe(result.phases[degree - k]);
        expect(result.residual).toBeLessThanOrEqual(1e-12);
        expect(directError(result.phases, target, 301)).toBeLessThanOrEqual(1e-12);
        // The reported residual, recomputed by the direct product on the same 2(d+1) Chebyshev points.
        let same = 0;
        for (let l = 0; l < 2 * (degree + 1); l++) {
          const x = Math.cos((Math.PI * (2 * l + 1)) / (4 * (degree + 1)));
          same = Math.max(same, Math.abs(qspMatrixElement(result.phases, x).re - evaluateChebyshev(target, x)));
        }
        expect(Math.abs(same - result.residual)).toBeLessThanOrEqual(2e-13);
      }),
      { numRuns: 30 },
    );
  });

  it('gives phases for the 1/x approximation with δ = 0.02 (degree above the Newton range, so the fixed-point iteration)', () => {
    const { polynomial, degree } = inverseApproximation(0.02, 1e-6);
    expect(degree).toBeGreaterThan(601); // Newton is the first choice up to 300 reduced phases
    const result = qspPhases(polynomial);
    expect(result.residual).toBeLessThanOrEqual(1e-12);
    expect(directError(result.phases, polynomial, 101)).toBeLessThanOrEqual(1e-12);
  });

  it('handles the constant and the linear target: phases for 0.4 and 0.5·x', () => {
    const constant = qspPhases({ parity: 'even', coefficients: Float64Array.from([0.4]) });
    expectClose(qspMatrixElement(constant.phases, 0.123).re, 0.4, 1e-15);
    const linear = qspPhases({ parity: 'odd', coefficients: Float64Array.from([0, 0.5]) });
    expect(linear.phases.length).toBe(2);
    expectClose(qspMatrixElement(linear.phases, -0.7).re, -0.35, 1e-15);
  });

  it('refuses a target without parity, with a coefficient of the wrong parity, or with sup-norm ≥ 1 (naming it)', () => {
    expect(() => qspPhases({ parity: 'none', coefficients: Float64Array.from([0, 0.5]) })).toThrow(/parity must be even or odd, got none/);
    expect(() => qspPhases({ parity: 'odd', coefficients: Float64Array.from([0.1, 0.5]) })).toThrow(/nonzero coefficient 0.1 of T_0/);
    expect(() => qspPhases({ parity: 'odd', coefficients: Float64Array.from([0, 0, 0, 1]) })).toThrow(/sup-norm 1 is too close to 1/);
    expect(() => qspPhases({ parity: 'odd', coefficients: Float64Array.from([0, 1.25]) })).toThrow(/sup-norm 1.25 /);
  });

  it('refuses to return phases that miss the tolerance', () => {
    expect(() => qspPhases(randomTarget(40, 5, 0.8), { maxIterations: 1 })).toThrow(/no phases within tolerance 1e-12/);
  });
});
