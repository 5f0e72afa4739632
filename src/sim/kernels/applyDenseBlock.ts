/**
 * applyDenseBlock: a dense 2^t × 2^t complex matrix on t target bits in one pass (the kernel of fused
 * gate runs). For each index of the pattern (controls at their values, targets 0) the 2^t amplitudes
 * at index + offsets[j] are gathered, multiplied by the matrix and scattered back. Only the free-bit
 * counter range [from, to) is touched. Two target bits (4 × 4) have an unrolled loop: the generic
 * loop is several times slower per product than the pair kernels.
 */
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

/** `matrix`: row-major, interleaved (re, im), entry (r, c) at 2·(r·2^t + c). */
export function applyDenseBlock(
  re: Float64Array, im: Float64Array, pattern: IndexPattern, offsets: Int32Array, matrix: Float64Array,
  from = 0, to = pattern.outer * pattern.run,
): void {
  if (offsets.length === 4) {
    applyDense4(re, im, pattern, offsets, matrix, from, to);
    return;
  }
  const { positions, value, run } = pattern;
  const dim = offsets.length;
  const xr = new Float64Array(dim);
  const xi = new Float64Array(dim);
  for (let x = from; x < to;) {
    const offset = x & (run - 1);
    const length = Math.min(run - offset, to - x);
    const start = (deposit(x - offset, positions) | value) + offset;
    const end = start + length;
    x += length;
    for (let base = start; base < end; base++) {
      for (let c = 0; c < dim; c++) {
        const i = base + offsets[c]!;
        xr[c] = re[i]!;
        xi[c] = im[i]!;
      }
      let e = 0;
      for (let r = 0; r < dim; r++) {
        let sr = 0;
        let si = 0;
        for (let c = 0; c < dim; c++, e += 2) {
          const mr = matrix[e]!;
          const mi = matrix[e + 1]!;
          sr += mr * xr[c]! - mi * xi[c]!;
          si += mr * xi[c]! + mi * xr[c]!;
        }
        const i = base + offsets[r]!;
        re[i] = sr;
        im[i] = si;
      }
    }
  }
}

function applyDense4(
  re: Float64Array, im: Float64Array, pattern: IndexPattern, offsets: Int32Array, m: Float64Array, from: number, to: number,
): void {
  const { positions, value, run } = pattern;
  const o1 = offsets[1]!;
  const o2 = offsets[2]!;
  const o3 = offsets[3]!;
  // Indexed reads: destructuring a typed array goes through its iterator.
  const m00r = m[0]!;
  const m00i = m[1]!;
  const m01r = m[2]!;
  const m01i = m[3]!;
  const m02r = m[4]!;
  const m02i = m[5]!;
  const m03r = m[6]!;
  const m03i = m[7]!;
  const m10r = m[8]!;
  const m10i = m[9]!;
  const m11r = m[10]!;
  const m11i = m[11]!;
  const m12r = m[12]!;
  const m12i = m[13]!;
  const m13r = m[14]!;
  const m13i = m[15]!;
  const m20r = m[16]!;
  const m20i = m[17]!;
  const m21r = m[18]!;
  const m21i = m[19]!;
  const m22r = m[20]!;
  const m22i = m[21]!;
  const m23r = m[22]!;
  const m23i = m[23]!;
  const m30r = m[24]!;
  const m30i = m[25]!;
  const m31r = m[26]!;
  const m31i = m[27]!;
  const m32r = m[28]!;
  const m32i = m[29]!;
  const m33r = m[30]!;
  const m33i = m[31]!;
  for (let x = from; x < to;) {
    const offset = x & (run - 1);
    const length = Math.min(run - offset, to - x);
    const start = (deposit(x - offset, positions) | value) + offset;
    const end = start + length;
    x += length;
    for (let i0 = start; i0 < end; i0++) {
      const i1 = i0 + o1;
      const i2 = i0 + o2;
      const i3 = i0 + o3;
      const ar = re[i0]!;
      const ai = im[i0]!;
      const br = re[i1]!;
      const bi = im[i1]!;
      const cr = re[i2]!;
      const ci = im[i2]!;
      const dr = re[i3]!;
      const di = im[i3]!;
      re[i0] = m00r * ar - m00i * ai + m01r * br - m01i * bi + m02r * cr - m02i * ci + m03r * dr - m03i * di;
      im[i0] = m00r * ai + m00i * ar + m01r * bi + m01i * br + m02r * ci + m02i * cr + m03r * di + m03i * dr;
      re[i1] = m10r * ar - m10i * ai + m11r * br - m11i * bi + m12r * cr - m12i * ci + m13r * dr - m13i * di;
      im[i1] = m10r * ai + m10i * ar + m11r * bi + m11i * br + m12r * ci + m12i * cr + m13r * di + m13i * dr;
      re[i2] = m20r * ar - m20i * ai + m21r * br - m21i * bi + m22r * cr - m22i * ci + m23r * dr - m23i * di;
      im[i2] = m20r * ai + m20i * ar + m21r * bi + m21i * br + m22r * ci + m22i * cr + m23r * di + m23i * dr;
      re[i3] = m30r * ar - m30i * ai + m31r * br - m31i * bi + m32r * cr - m32i * ci + m33r * dr - m33i * di;
      im[i3] = m30r * ai + m30i * ar + m31r * bi + m31i * br + m32r * ci + m32i * cr + m33r * di + m33i * dr;
    }
  }
}
