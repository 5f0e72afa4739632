import { describe, expect, it } from 'vitest';
import { evaluateChebyshev } from '../../src/polynomial/evaluateChebyshev.js';
import { qspPhases } from '../../src/polynomial/qspPhases.js';
import { reflectionPhases } from '../../src/qsvt/reflectionPhases.js';
import { reflectionSequenceValue } from '../../src/qsvt/reflectionSequenceValue.js';

describe('reflectionSequenceValue', () => {
  it('gives back the target polynomial of W_x phases after reflectionPhases (odd and even targets)', () => {
    const targets = [
      { parity: 'odd' as const, coefficients: Float64Array.from([0, 0.4, 0, -0.2, 0, 0.1]) },
      { parity: 'even' as const, coefficients: Float64Array.from([0.1, 0, 0.3, 0, -0.25]) },
    ];
    for (const target of targets) {
      const psi = reflectionPhases(qspPhases(target).phases);
      for (const x of [0, 0.13, 0.5, 0.77, 1]) expect(Math.abs(reflectionSequenceValue(psi, x) - evaluateChebyshev(target, x))).toBeLessThan(1e-11);
    }
  });

  it('with all phases zero is the d-th power of the reflection R(σ): σ for odd d, 1 for even d (R² = I)', () => {
    expect(reflectionSequenceValue(new Float64Array(4), 0.3)).toBeCloseTo(0.3, 14);
    expect(reflectionSequenceValue(new Float64Array(5), 0.3)).toBeCloseTo(1, 14);
  });

  it('refuses fewer than two phases and σ outside [0, 1]', () => {
    expect(() => reflectionSequenceValue(new Float64Array(1), 0.5)).toThrow(/at least two phases/);
    expect(() => reflectionSequenceValue(new Float64Array(3), 1.5)).toThrow(/σ = 1.5/);
  });
});
