// flagIntervals: aligned dyadic intervals of register values on which one flag rotation (that of a representative value)
// is within `budget` of f(v) = c/(w − E*(v)) for every occupied v — fine near Re w, coarse far from it.
import type { RegisterEnergies } from './flagAmplitude.js';

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
 * The least and greatest E* over every aligned block of 2^level values up to top, for level 0 … bits (±Infinity where no
 * value of the block is occupied): each level from the one below, so an interval's range is one lookup, not a scan.
 */
function blockRanges(centre: Float64Array, top: number, bits: number): { low: Float64Array[]; high: Float64Array[] } {
  const lowest = new Float64Array(top + 1);
  const highest = new Float64Array(top + 1);
  for (let v = 0; v <= top; v++) {
    const e = centre[v]!;
    lowest[v] = Number.isNaN(e) ? Infinity : e;
    highest[v] = Number.isNaN(e) ? -Infinity : e;
  }
  const low = [lowest];
  const high = [highest];
  for (let level = 1; level <= bits; level++) {
    const lowBelow = low[level - 1]!;
    const highBelow = high[level - 1]!;
    const size = Math.ceil(lowBelow.length / 2);
    const lows = new Float64Array(size);
    const highs = new Float64Array(size);
    for (let b = 0; b < size; b++) {
      const pair = 2 * b + 1 < lowBelow.length;
      lows[b] = pair ? Math.min(lowBelow[2 * b]!, lowBelow[2 * b + 1]!) : lowBelow[2 * b]!;
      highs[b] = pair ? Math.max(highBelow[2 * b]!, highBelow[2 * b + 1]!) : highBelow[2 * b]!;
    }
    low.push(lows);
    high.push(highs);
  }
  return { low, high };
}

/** The occupied value of start … hi nearest (start + hi)/2, the smaller on a tie; −1 when none is occupied. */
function nearestToMiddle(centre: Float64Array, start: number, hi: number): number {
  const below = Math.floor((start + hi) / 2);
  const above = Math.ceil((start + hi) / 2);
  for (let d = 0; below - d >= start || above + d <= hi; d++) {
    if (below - d >= start && !Number.isNaN(centre[below - d]!)) return below - d;
    if (above + d <= hi && !Number.isNaN(centre[above + d]!)) return above + d;
  }
  return -1;
}

/**
 * For occupied v, u in one interval, |f(v) − f(u)| = c|E*(v) − E*(u)| / (|w − E*(v)||w − E*(u)|) ≤ c·max|E* − E*(u)| /
 * (d·|w − E*(u)|), d = the distance from w to the hull of the interval's E*. Intervals are split until this is ≤ budget
 * (or one value); an interval no occupation reaches needs no rotation and is left out.
 */
export function flagIntervals(r: RegisterEnergies, bits: number, budget: number): FlagInterval[] {
  const out: FlagInterval[] = [];
  const centre = r.centre;
  const ranges = blockRanges(centre, r.top, bits);
  const visit = (start: number, level: number): void => {
    if (start > r.top) return;
    const eLo = ranges.low[level]![start / 2 ** level]!;
    if (eLo === Infinity) return;
    const eHi = ranges.high[level]![start / 2 ** level]!;
    const representative = nearestToMiddle(centre, start, Math.min(start + 2 ** level - 1, r.top));
    const eRep = centre[representative]!;
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
