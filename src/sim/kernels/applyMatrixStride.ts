/**
 * applyMatrixStride: a general 2×2 matrix on one target with no controls, as the plain pair loop
 * (pairs (i, i + stride) in runs of `stride`) — the hot path of the simulator. For strides below 8
 * the pairs are enumerated in one flat loop instead, so no inner loop is shorter than 8. Only the
 * pairs numbered [from, to) are touched (pair k has the zero target bit inserted into k), so index
 * ranges can be split between threads.
 */
import type { Matrix2 } from '../../circuit/standardGates.js';

const SHORT_STRIDE = 8;

export function applyMatrixStride(re: Float64Array, im: Float64Array, stride: number, m: Matrix2, from = 0, to = re.length >>> 1): void {
  const [ar, ai, br, bi, cr, ci, dr, di] = m;
  if (stride === 1) {
    // Neighbouring pairs (2k, 2k + 1).
    for (let i = 2 * from; i < 2 * to; i += 2) {
      const xr = re[i]!;
      const xi = im[i]!;
      const yr = re[i + 1]!;
      const yi = im[i + 1]!;
      re[i] = ar * xr - ai * xi + br * yr - bi * yi;
      im[i] = ar * xi + ai * xr + br * yi + bi * yr;
      re[i + 1] = cr * xr - ci * xi + dr * yr - di * yi;
      im[i + 1] = cr * xi + ci * xr + dr * yi + di * yr;
    }
    return;
  }
  if (stride < SHORT_STRIDE) {
    const low = stride - 1;
    for (let k = from; k < to; k++) {
      // Insert a zero bit at the target position: i = (high bits << 1) | low bits.
      const i = ((k & ~low) << 1) | (k & low);
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
    return;
  }
  for (let k = from; k < to;) {
    const offset = k & (stride - 1);
    const length = Math.min(stride - offset, to - k);
    const start = 2 * (k - offset) + offset;
    const end = start + length;
    k += length;
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
