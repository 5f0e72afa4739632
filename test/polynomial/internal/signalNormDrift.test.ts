import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { signalNormDrift } from '../../../src/polynomial/internal/signalNormDrift.js';

/** A finite double as an exact BigInt multiple of 2^-1074 (IEEE 754 binary64 layout). */
function exactUnits(value: number): bigint {
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, value);
  const bits = view.getBigUint64(0);
  const exponent = Number((bits >> 52n) & 0x7ffn);
  const fraction = bits & ((1n << 52n) - 1n);
  const mantissa = exponent === 0 ? fraction : fraction | (1n << 52n);
  const units = mantissa << BigInt(Math.max(exponent - 1, 0));
  return bits >> 63n ? -units : units;
}

describe('signalNormDrift(x, s)', () => {
  it('equals x² + s² − 1 computed exactly in rational arithmetic, for s = fl(√(1 − x²))', () => {
    fc.assert(
      fc.property(fc.double({ min: -1, max: 1, noNaN: true }), (x) => {
        const s = Math.sqrt((1 - x) * (1 + x));
        const scale = 1n << 2148n; // 1 in units of (2^-1074)²
        const exact = exactUnits(x) ** 2n + exactUnits(s) ** 2n - scale;
        // exact / 2^2148 as a double, from its leading 60 bits (relative error ≤ 2^-59).
        const magnitude = exact < 0n ? -exact : exact;
        const shift = Math.max(0, magnitude.toString(2).length - 60);
        const reference = Math.sign(Number(exact)) * Number(magnitude >> BigInt(shift)) * 2 ** (shift - 1074) * 2 ** -1074;
        expect(Math.abs(signalNormDrift(x, s) - reference)).toBeLessThanOrEqual(1e-300 + 1e-15 * Math.abs(reference)); // subnormal x² need not be exact
      }),
      { numRuns: 500 },
    );
  });
});
