// flagIntervals: aligned dyadic intervals of register values on which one flag rotation (that of a representative value)
// is within `budget` of f(v) = c/(w − E*(v)) for every occupied v — fine near Re w, coarse far from it.
import { occupied, type RegisterEnergies } from './flagAmplitude.js';

export interface FlagInterval {
  /** Values v0 … v0 + 2^level − 1 (v0 a multiple of 2^level). */
  readonly start: number;
  readonly level: number;
  /** The occupied value whose angles the interval uses. */
  readonly representative: number;
  /** Rigorous bound on max |f(v) − f(representative)| over the interval's occupied values. */
  readonly error: number;
}

/**
 * For occupied v, u in one interval, |f(v) − f(u)| = c|E*(v) − E*(u)| / (|w − E*(v)||w − E*(u)|) ≤ c·max|E* − E*(u)| /
 * (d·|w − E*(u)|), d = the distance from w to the hull of the interval's E*. Intervals are split until this is ≤ budget
 * (or one value); an interval no occupation reaches needs no rotation and is left out.
 */
export function flagIntervals(r: RegisterEnergies, bits: number, budget: number): FlagInterval[] {
  const out: FlagInterval[] = [];
  const visit = (start: number, level: number): void => {
    const hi = Math.min(start + 2 ** level - 1, r.top);
    let eLo = Infinity;
    let eHi = -Infinity;
    let representative = -1;
    const middle = (start + hi) / 2;
    for (let v = start; v <= hi; v++) {
      if (!occupied(r, v)) continue;
      eLo = Math.min(eLo, r.centre[v]!);
      eHi = Math.max(eHi, r.centre[v]!);
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
