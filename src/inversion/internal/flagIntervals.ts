// flagIntervals: aligned dyadic intervals of register values on which one flag rotation (that of a representative value)
// is within `budget` of f(v) = c/(w − E(v)) for every v — fine near Re w, coarse far from it.
import { energyAt, type RegisterEnergies } from './flagAmplitude.js';

export interface FlagInterval {
  /** Values v0 … v0 + 2^level − 1 (v0 a multiple of 2^level). */
  readonly start: number;
  readonly level: number;
  /** The representative value whose angles the interval uses. */
  readonly representative: number;
  /** Rigorous bound on max_v |f(v) − f(representative)| over the interval's values ≤ R. */
  readonly error: number;
}

/**
 * For v, u in one interval, |f(v) − f(u)| = c|E(v) − E(u)| / (|w − E(v)||w − E(u)|) ≤ c·max|E − E(u)| / (d·|w − E(u)|),
 * d = the distance from w to the interval's energy segment. Intervals are split until this is ≤ budget (or one value).
 */
export function flagIntervals(r: RegisterEnergies, bits: number, budget: number): FlagInterval[] {
  const out: FlagInterval[] = [];
  const visit = (start: number, level: number): void => {
    const lo = start;
    const hi = Math.min(start + 2 ** level - 1, r.top);
    if (lo > hi) return;
    const representative = Math.round((lo + hi) / 2);
    const eLo = energyAt(r, lo);
    const eHi = energyAt(r, hi);
    const eRep = energyAt(r, representative);
    const gap = r.w.re < eLo ? eLo - r.w.re : r.w.re > eHi ? r.w.re - eHi : 0;
    const distance = Math.hypot(gap, r.w.im);
    const error = lo === hi ? 0 : (r.c * Math.max(eHi - eRep, eRep - eLo)) / (distance * Math.hypot(r.w.re - eRep, r.w.im));
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
