// resolveGate: integer powers are exact at huge exponents — by the gate algebra x² = h² = I, s⁴ = sx⁴ = I,
// t⁸ = I (Nielsen & Chuang §4.2, from memory), rotations g(θ)^k = g(kθ) with kθ reduced exactly, and the
// eigenphase route for any other gate — and powers beyond 2^53 in magnitude are refused.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { FlatGate } from '../../src/circuit/flatten.js';
import { reduceAngle } from '../../src/circuit/internal/reduceAngle.js';
import { MAX_GATE_POWER, resolveGate } from '../../src/circuit/resolveGate.js';
import type { Matrix2 } from '../../src/circuit/standardGates.js';
import { expectClose } from '../helpers/close.js';

function flat(name: string, params: readonly number[], power: number, inverse = false): FlatGate {
  return { kind: 'gate', name, params, qubits: [0], controls: [], negControls: [], inverse, power };
}

function matrixOf(name: string, params: readonly number[], power: number, inverse = false): Matrix2 {
  const resolved = resolveGate(flat(name, params, power, inverse));
  if (resolved.kind !== 'unitary') throw new Error('expected a unitary');
  return resolved.matrix;
}

function expectMatrix(actual: Matrix2, expected: Matrix2, tol: number, label: string): void {
  actual.forEach((v, k) => expectClose(v, expected[k]!, tol, `${label}[${k}]`));
}

const BIG = 2 ** 40;

describe('resolveGate integer powers', () => {
  it('pow(2^40) @ x = I and pow(2^40 + 1) @ x = x exactly (x² = I)', () => {
    expect(matrixOf('x', [], BIG)).toEqual([1, 0, 0, 0, 0, 0, 1, 0]);
    expect(matrixOf('x', [], BIG + 1)).toEqual(matrixOf('x', [], 1));
  });

  it('pow(1e15) @ h = I and pow(2^40 + 1) @ h = h (h² = I)', () => {
    expect(matrixOf('h', [], 1e15)).toEqual([1, 0, 0, 0, 0, 0, 1, 0]);
    expect(matrixOf('h', [], BIG + 1)).toEqual(matrixOf('h', [], 1));
  });

  it('t⁸ = I, s⁴ = I, sx⁴ = I: pow(8·2^37 + 3) @ t = t³, pow(2^40 + 1) @ s = s, pow(−(2^40) − 1) @ sx = inv @ sx', () => {
    expectMatrix(matrixOf('t', [], BIG + 3), matrixOf('t', [], 3), 0, 't');
    expectMatrix(matrixOf('s', [], BIG + 1), matrixOf('s', [], 1), 0, 's');
    expectMatrix(matrixOf('sx', [], -BIG - 1), matrixOf('sx', [], 1, true), 1e-15, 'sx');
  });

  it('pow(2^40) @ rz(θ) = rz(2^40·θ) with the angle reduced exactly: equal to rz(θ)^(2^40) by repeated squaring in exact π units', () => {
    // θ = π/2^20 (a power-of-two fraction of the double π): 2^40·θ = 2^20·π_double, and 2^20 is a multiple of 4,
    // so the exact answer is rz(2^20·(π_double − π)) where π − π_double = sin(π_double) to double precision (common practice).
    const theta = Math.PI / 2 ** 20;
    const drift = -(2 ** 20) * Math.sin(Math.PI);
    const expected = matrixOf('rz', [drift], 1);
    expectMatrix(matrixOf('rz', [theta], BIG), expected, 1e-15, 'rz');
  });

  it('pow(k) @ p(λ) equals p(kλ) for small k (fast-check), and agrees with the repeated product', () => {
    fc.assert(
      fc.property(fc.integer({ min: -500, max: 500 }), fc.double({ min: -10, max: 10, noNaN: true }), (k, lambda) => {
        expectMatrix(matrixOf('p', [lambda], k), matrixOf('p', [k * lambda], 1), 1e-12, 'p');
        expectMatrix(matrixOf('rx', [lambda], k), matrixOf('rx', [k * lambda], 1), 1e-12, 'rx');
      }),
      { numRuns: 200 },
    );
  });

  it('general gates (U) go through eigenphases reduced exactly mod 2π: pow(2^40) @ U(θ, 0, 0) = U(2^40·θ, 0, 0)', () => {
    // In 3.0.0 U(θ, 0, 0) = e^{iθ/2} ry(θ), so U(θ, 0, 0)^k = U(kθ, 0, 0), 2π-periodic in θ ("Built-in gates").
    // θ = π_double/2^20: 2^40·θ ≡ 2^20·(π_double − π) = −2^20·sin(π_double) (mod 2π). The eigenphase θ of the
    // stored matrix carries a relative rounding error ~1e-16, i.e. ~2^40·θ·1e-16 ≈ 4e-10 after the power.
    const theta = Math.PI / 2 ** 20;
    expectMatrix(matrixOf('U', [theta, 0, 0], BIG), matrixOf('U', [-(2 ** 20) * Math.sin(Math.PI), 0, 0], 1), 1e-8, 'U');
  });

  it('the general route equals the repeated product for 65 ≤ |k| ≤ 200 on random U and cu targets (fast-check)', () => {
    const times = (a: Matrix2, b: Matrix2): Matrix2 => {
      const z = (m: Matrix2, e: number): [number, number] => [m[2 * e]!, m[2 * e + 1]!];
      const mul = (x: [number, number], y: [number, number]): [number, number] => [x[0] * y[0] - x[1] * y[1], x[0] * y[1] + x[1] * y[0]];
      const add = (x: [number, number], y: [number, number]): [number, number] => [x[0] + y[0], x[1] + y[1]];
      return [...add(mul(z(a, 0), z(b, 0)), mul(z(a, 1), z(b, 2))), ...add(mul(z(a, 0), z(b, 1)), mul(z(a, 1), z(b, 3))),
        ...add(mul(z(a, 2), z(b, 0)), mul(z(a, 3), z(b, 2))), ...add(mul(z(a, 2), z(b, 1)), mul(z(a, 3), z(b, 3)))] as unknown as Matrix2;
    };
    const angle = fc.double({ min: -4, max: 4, noNaN: true });
    fc.assert(
      fc.property(fc.integer({ min: 65, max: 200 }), fc.boolean(), angle, angle, angle, (k, negative, t, f, l) => {
        const one = matrixOf('U', [t, f, l], negative ? -1 : 1);
        let expected: Matrix2 = [1, 0, 0, 0, 0, 0, 1, 0];
        for (let r = 0; r < k; r++) expected = times(expected, one);
        expectMatrix(matrixOf('U', [t, f, l], negative ? -k : k), expected, 1e-11, 'U^k');
      }),
      { numRuns: 100 },
    );
  });

  it('gphase: pow(2^40) @ gphase(π/2^20) has the exactly reduced angle', () => {
    const resolved = resolveGate({ kind: 'gate', name: 'gphase', params: [Math.PI / 2 ** 20], qubits: [], controls: [], negControls: [], inverse: false, power: BIG });
    expect(resolved.kind).toBe('phase');
    if (resolved.kind === 'phase') expectClose(resolved.angle, -(2 ** 20) * Math.sin(Math.PI), 1e-15, 'angle');
  });

  it('refuses powers beyond 2^53 in magnitude with a RangeError, accepts ±2^53', () => {
    expect(() => resolveGate(flat('h', [], -1e308))).toThrow(RangeError);
    expect(() => resolveGate(flat('h', [], Infinity))).toThrow(RangeError);
    expect(matrixOf('h', [], MAX_GATE_POWER)).toEqual([1, 0, 0, 0, 0, 0, 1, 0]);
  });

  it('takes rz to the power 2^53 (beyond the safe integers, still exact as a double): rz(0)^k = I (a fuzz finding)', () => {
    // rz(θ)^k = rz(kθ) (Nielsen & Chuang §4.2); with θ = 0 every power is the identity.
    matrixOf('rz', [0], MAX_GATE_POWER).forEach((x, k) => expect(Math.abs(x - [1, 0, 0, 0, 0, 0, 1, 0][k]!)).toBeLessThanOrEqual(1e-15));
    expect(() => resolveGate(flat('rz', [0.3], MAX_GATE_POWER))).not.toThrow();
  });
});

describe('reduceAngle', () => {
  it('reduceAngle(2^40, π_double, 2) = 2^40·(π_double − π) = −2^40·sin(π_double)', () => {
    // sin(π_double) = π − π_double to double precision (common practice).
    expectClose(reduceAngle(BIG, Math.PI, 2), -BIG * Math.sin(Math.PI), 1e-15, 'reduced');
  });

  it('agrees with k·a mod period computed in doubles when k·a is small (fast-check), and lands in [−P/2, P/2)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1000, max: 1000 }), fc.double({ min: -100, max: 100, noNaN: true }), fc.constantFrom<2 | 4>(2, 4), (k, a, period) => {
        const r = reduceAngle(k, a, period);
        const half = (period * Math.PI) / 2;
        expect(r >= -half - 1e-12 && r < half + 1e-12).toBe(true);
        const diff = k * a - r;
        const turns = Math.round(diff / (period * Math.PI));
        expectClose(diff, turns * period * Math.PI, 1e-9, 'multiple of the period');
      }),
      { numRuns: 300 },
    );
  });
});
