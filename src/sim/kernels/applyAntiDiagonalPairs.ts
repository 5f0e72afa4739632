/**
 * applyAntiDiagonalPairs: [[0, b], [c, 0]] on the target bit over the pairs (i, i + stride) of an
 * IndexPattern (target fixed at 0); with b = c = 1 (X) the pair is swapped without arithmetic.
 */
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

export function applyAntiDiagonalPairs(
  re: Float64Array, im: Float64Array, pattern: IndexPattern, stride: number,
  br: number, bi: number, cr: number, ci: number,
  from = 0, to = pattern.outer * pattern.run,
): void {
  const { positions, value, run } = pattern;
  const isX = br === 1 && bi === 0 && cr === 1 && ci === 0;
  for (let x = from; x < to;) {
    const offset = x & (run - 1);
    const length = Math.min(run - offset, to - x);
    const start = (deposit(x - offset, positions) | value) + offset;
    const end = start + length;
    x += length;
    if (isX) {
      for (let i = start; i < end; i++) {
        const j = i + stride;
        const xr = re[i]!;
        const xi = im[i]!;
        re[i] = re[j]!;
        im[i] = im[j]!;
        re[j] = xr;
        im[j] = xi;
      }
      continue;
    }
    for (let i = start; i < end; i++) {
      const j = i + stride;
      const xr = re[i]!;
      const xi = im[i]!;
      const yr = re[j]!;
      const yi = im[j]!;
      re[i] = br * yr - bi * yi;
      im[i] = br * yi + bi * yr;
      re[j] = cr * xr - ci * xi;
      im[j] = cr * xi + ci * xr;
    }
  }
}
