// flagIntervals: the dyadic split equals the one found by scanning every interval's values (the definition: an interval's
// E* range and its occupied value nearest the middle, the smaller on a tie), and every interval's bound holds.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { RegisterEnergies } from '../../../src/inversion/internal/flagAmplitude.js';
import { flagIntervals, type FlagInterval } from '../../../src/inversion/internal/flagIntervals.js';

/** The split by scanning each visited interval value by value. */
function scannedIntervals(r: RegisterEnergies, bits: number, budget: number): FlagInterval[] {
  const out: FlagInterval[] = [];
  const visit = (start: number, level: number): void => {
    const hi = Math.min(start + 2 ** level - 1, r.top);
    let eLo = Infinity;
    let eHi = -Infinity;
    let representative = -1;
    const middle = (start + hi) / 2;
    for (let v = start; v <= hi; v++) {
      const e = r.centre[v]!;
      if (Number.isNaN(e)) continue;
      eLo = Math.min(eLo, e);
      eHi = Math.max(eHi, e);
      if (representative < 0 || Math.abs(v - middle) < Math.abs(representative - middle)) representative = v;
    }
    if (representative < 0) return;
    const eRep = r.centre[representative]!;
    const gap = r.w.re < eLo ? eLo - r.w.re : r.w.re > eHi ? r.w.re - eHi : 0;
    const error = eHi === eLo ? 0 : (r.c * Math.max(eHi - eRep, eRep - eLo)) / (Math.hypot(gap, r.w.im) * Math.hypot(r.w.re - eRep, r.w.im));
    if (level === 0 || error <= budget) {
      out.push({ start, level, representative, error });
      return;
    }
    visit(start, level - 1);
    visit(start + 2 ** (level - 1), level - 1);
  };
  visit(0, bits);
  return out;
}

const energiesArb = fc.integer({ min: 1, max: 8 }).chain((bits) =>
  fc.record({
    bits: fc.constant(bits),
    top: fc.integer({ min: 0, max: 2 ** bits - 1 }),
    centres: fc.array(fc.option(fc.double({ min: -5, max: 5, noNaN: true }), { freq: 3 }), { minLength: 2 ** bits, maxLength: 2 ** bits }),
    w: fc.record({ re: fc.double({ min: -6, max: 6, noNaN: true }), im: fc.double({ min: 0.05, max: 1, noNaN: true }) }),
    budget: fc.double({ min: 1e-6, max: 0.5, noNaN: true }),
  }),
);

function registerEnergiesOf(top: number, centres: (number | null)[], w: { re: number; im: number }): RegisterEnergies {
  const centre = Float64Array.from(centres.slice(0, top + 1), (e) => e ?? Number.NaN);
  const nan = new Float64Array(top + 1).fill(Number.NaN);
  return { top, w, centre, hull: { low: nan, high: nan }, gap: w.im, c: w.im, rounding: 0, decomposition: 0, exact: true };
}

describe('flagIntervals(r, bits, budget)', () => {
  it('splits exactly as scanning every interval does (same intervals, representatives and bounds)', () => {
    fc.assert(
      fc.property(energiesArb, ({ bits, top, centres, w, budget }) => {
        const r = registerEnergiesOf(top, centres, w);
        expect(flagIntervals(r, bits, budget)).toEqual(scannedIntervals(r, bits, budget));
      }),
      { numRuns: 300 },
    );
  });

  it('covers every occupied value once, and each interval meets the budget or is a single value', () => {
    fc.assert(
      fc.property(energiesArb, ({ bits, top, centres, w, budget }) => {
        const r = registerEnergiesOf(top, centres, w);
        const covered: number[] = [];
        for (const interval of flagIntervals(r, bits, budget)) {
          expect(interval.level === 0 || interval.error <= budget).toBe(true);
          for (let v = interval.start; v < interval.start + 2 ** interval.level && v <= top; v++) if (!Number.isNaN(r.centre[v]!)) covered.push(v);
        }
        const occupied = Array.from(r.centre.keys()).filter((v) => !Number.isNaN(r.centre[v]!));
        expect(covered).toEqual(occupied);
      }),
      { numRuns: 200 },
    );
  });
});
