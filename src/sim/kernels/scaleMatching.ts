/**
 * scaleMatching: multiplies every amplitude of an IndexPattern by one complex factor — the kernel
 * of (controlled) global phases, of diag(1, d) with the target fixed at 1, and of (multi-controlled)
 * Z, where the factor −1 is a plain sign flip.
 */
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

export function scaleMatching(re: Float64Array, im: Float64Array, pattern: IndexPattern, fr: number, fi: number): void {
  const { positions, value, outer, run } = pattern;
  const negate = fr === -1 && fi === 0;
  for (let o = 0; o < outer; o++) {
    const start = deposit(o * run, positions) | value;
    const end = start + run;
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
