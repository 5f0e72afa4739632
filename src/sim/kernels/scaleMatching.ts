/**
 * scaleMatching: multiplies every amplitude of an IndexPattern by one complex factor — the kernel
 * of (controlled) global phases, of diag(1, d) with the target fixed at 1, and of (multi-controlled)
 * Z, where the factor −1 is a plain sign flip.
 */
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

export function scaleMatching(re: Float64Array, im: Float64Array, pattern: IndexPattern, fr: number, fi: number, from = 0, to = pattern.outer * pattern.run): void {
  const { positions, value, run } = pattern;
  const negate = fr === -1 && fi === 0;
  for (let x = from; x < to;) {
    const offset = x & (run - 1);
    const length = Math.min(run - offset, to - x);
    const start = (deposit(x - offset, positions) | value) + offset;
    const end = start + length;
    x += length;
    if (negate) {
      for (let i = start; i < end; i++) {
        re[i] = -re[i]!;
        im[i] = -im[i]!;
      }
      continue;
    }
    for (let i = start; i < end; i++) {
      const xr = re[i]!;
      const xi = im[i]!;
      re[i] = fr * xr - fi * xi;
      im[i] = fr * xi + fi * xr;
    }
  }
}
