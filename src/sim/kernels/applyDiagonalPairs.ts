/**
 * applyDiagonalPairs: diag(a, d) on the target bit over the pairs (i, i + stride) of an IndexPattern
 * (target fixed at 0); no amplitude is mixed with another.
 */
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

export function applyDiagonalPairs(
  re: Float64Array, im: Float64Array, pattern: IndexPattern, stride: number,
  ar: number, ai: number, dr: number, di: number,
  from = 0, to = pattern.outer * pattern.run,
): void {
  const { positions, value, run } = pattern;
  for (let x = from; x < to;) {
    const offset = x & (run - 1);
    const length = Math.min(run - offset, to - x);
    const start = (deposit(x - offset, positions) | value) + offset;
    const end = start + length;
    x += length;
    for (let i = start; i < end; i++) {
      const j = i + stride;
      const xr = re[i]!;
      const xi = im[i]!;
      const yr = re[j]!;
      const yi = im[j]!;
      re[i] = ar * xr - ai * xi;
      im[i] = ar * xi + ai * xr;
      re[j] = dr * yr - di * yi;
      im[j] = dr * yi + di * yr;
    }
  }
}
