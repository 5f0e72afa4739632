// registerHull and cachedRegisterHull: the subset-sum tables equal a listing of every occupation of the window, bit for bit
// (both add a subset's energies in mode order, and rounding is monotone, so the least and greatest sums agree exactly),
// and the cache returns the uncached result.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cachedRegisterHull } from '../../../src/inversion/internal/cachedRegisterHull.js';
import { registerHull } from '../../../src/inversion/internal/registerHull.js';

interface Case {
  readonly energies: Float64Array;
  readonly weights: number[];
  readonly window: { min: number; max: number };
}

const caseArb: fc.Arbitrary<Case> = fc
  .integer({ min: 1, max: 9 })
  .chain((n) =>
    fc.record({
      energies: fc.array(fc.double({ min: -3, max: 3, noNaN: true }), { minLength: n, maxLength: n }).map((e) => Float64Array.from(e)),
      weights: fc.array(fc.integer({ min: -4, max: 12 }), { minLength: n, maxLength: n }),
      window: fc.tuple(fc.integer({ min: 0, max: n }), fc.integer({ min: 0, max: n })).map(([a, b]) => ({ min: Math.min(a, b), max: Math.max(a, b) })),
    }),
  );

/** The register value's range of Σ a_k n_k over the window, as energyGrid lays it out. */
function layout(c: Case): { sumMin: number; top: number } {
  let sumMin = Infinity;
  let sumMax = -Infinity;
  for (let s = 0; s < 2 ** c.energies.length; s++) {
    const occupied = c.weights.filter((_, k) => (s >> k) & 1);
    if (occupied.length < c.window.min || occupied.length > c.window.max) continue;
    const sum = occupied.reduce((x, y) => x + y, 0);
    sumMin = Math.min(sumMin, sum);
    sumMax = Math.max(sumMax, sum);
  }
  return { sumMin, top: sumMax - sumMin };
}

/** Every occupation listed: its energy summed in mode order, min and max per register value. */
function listedHull(c: Case, sumMin: number, top: number): { low: number[]; high: number[] } {
  const low = Array.from({ length: top + 1 }, () => Number.NaN);
  const high = Array.from({ length: top + 1 }, () => Number.NaN);
  for (let s = 0; s < 2 ** c.energies.length; s++) {
    let count = 0;
    let value = -sumMin;
    let energy = 0;
    for (let k = 0; k < c.energies.length; k++) {
      if (((s >> k) & 1) === 0) continue;
      count += 1;
      value += c.weights[k]!;
      energy += c.energies[k]!;
    }
    if (count < c.window.min || count > c.window.max) continue;
    low[value] = Number.isNaN(low[value]!) ? energy : Math.min(low[value]!, energy);
    high[value] = Number.isNaN(high[value]!) ? energy : Math.max(high[value]!, energy);
  }
  return { low, high };
}

describe('registerHull(energies, weights, window, sumMin, top)', () => {
  it('equals the least and greatest energy of the listed occupations per register value, exactly', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const { sumMin, top } = layout(c);
        const hull = registerHull(c.energies, c.weights, c.window, sumMin, top);
        const listed = listedHull(c, sumMin, top);
        expect(Array.from(hull.low)).toEqual(listed.low);
        expect(Array.from(hull.high)).toEqual(listed.high);
      }),
      { numRuns: 300 },
    );
  });
});

describe('cachedRegisterHull(energies, …)', () => {
  it('returns what registerHull computes, and the same object for the same energies, layout and window', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const { sumMin, top } = layout(c);
        const cached = cachedRegisterHull(c.energies, c.weights, c.window, sumMin, top);
        const fresh = registerHull(c.energies, c.weights, c.window, sumMin, top);
        expect(Array.from(cached.low)).toEqual(Array.from(fresh.low));
        expect(Array.from(cached.high)).toEqual(Array.from(fresh.high));
        expect(cachedRegisterHull(c.energies, [...c.weights], { ...c.window }, sumMin, top)).toBe(cached);
      }),
      { numRuns: 100 },
    );
  });

  it('keeps hulls of other windows of the same energies apart', () => {
    const energies = Float64Array.from([-1.25, 0.5, 0.75, 2]);
    const weights = [0, 3, 4, 7];
    const one = cachedRegisterHull(energies, weights, { min: 1, max: 1 }, 0, 7);
    const two = cachedRegisterHull(energies, weights, { min: 2, max: 2 }, 3, 8);
    expect(two).not.toBe(one);
    expect(Array.from(two.low)).toEqual(Array.from(registerHull(energies, weights, { min: 2, max: 2 }, 3, 8).low));
  });
});
