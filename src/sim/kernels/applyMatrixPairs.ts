/**
 * applyMatrixPairs: a general 2×2 matrix on the target bit over the pairs (i, i + stride) where i
 * runs over an IndexPattern whose fixed bits include the target at 0 (and any controls).
 */
import type { Matrix2 } from '../../circuit/standardGates.js';
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

export function applyMatrixPairs(re: Float64Array, im: Float64Array, pattern: IndexPattern, stride: number, m: Matrix2, from = 0, to = pattern.outer * pattern.run): void {
  const [ar, ai, br, bi, cr, ci, dr, di] = m;
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
      re[i] = ar * xr - ai * xi + br * yr - bi * yi;
      im[i] = ar * xi + ai * xr + br * yi + bi * yr;
      re[j] = cr * xr - ci * xi + dr * yr - di * yi;
      im[j] = cr * xi + ci * xr + dr * yi + di * yr;
    }
  }
}
