/**
 * applyMatrixStride: a general 2×2 matrix on one target with no controls, as the plain pair loop
 * (blocks of 2·stride, pairs (i, i + stride)) — the hot path of the simulator. For strides below
 * 8 the pairs are enumerated in one flat loop instead, so no inner loop is shorter than 8.
 */
import type { Matrix2 } from '../../circuit/standardGates.js';

const SHORT_STRIDE = 8;

export function applyMatrixStride(re: Float64Array, im: Float64Array, stride: number, m: Matrix2): void {
  const [ar, ai, br, bi, cr, ci, dr, di] = m;
  const size = re.length;
  if (stride < SHORT_STRIDE) {
    const low = stride - 1;
    const pairs = size >>> 1;
    for (let k = 0; k < pairs; k++) {
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
  const step = 2 * stride;
  for (let base = 0; base < size; base += step) {
    const end = base + stride;
    for (let i = base; i < end; i++) {
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
