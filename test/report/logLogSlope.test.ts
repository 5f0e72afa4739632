// logLogSlope: recovers the exponent of an exact power law (property), is null where no exponent is defined.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { logLogSlope } from '../../src/report/logLogSlope.js';

describe('logLogSlope(x, y)', () => {
  it('returns b for y = a·x^b on distinct positive x', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: 1, max: 10_000 }), { minLength: 2, maxLength: 8 }),
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        fc.double({ min: -3, max: 4, noNaN: true }),
        (x, a, b) => {
          expect(logLogSlope(x, x.map((v) => a * v ** b))).toBeCloseTo(b, 9);
        },
      ),
      { numRuns: 100, seed: 3 },
    );
  });

  it('is null for one point, equal x, or a non-positive value, and refuses mismatched lengths', () => {
    expect(logLogSlope([2], [3])).toBeNull();
    expect(logLogSlope([2, 2], [3, 4])).toBeNull();
    expect(logLogSlope([1, 2], [0, 4])).toBeNull();
    expect(() => logLogSlope([1, 2], [1])).toThrow(RangeError);
  });
});
