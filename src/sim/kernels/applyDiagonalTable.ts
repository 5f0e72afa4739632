/**
 * applyDiagonalTable: a diagonal on t target bits in one pass (the kernel of fused runs of diagonal
 * gates). The pattern fixes only the controls, so indices run in long contiguous stretches; the
 * table index of an amplitude is gathered from its target bits: the low DIAGONAL_LOW_BITS bits through
 * the lookup `low`, the rest once per aligned block of 2^DIAGONAL_LOW_BITS indices. Only the free-bit
 * counter range [from, to) is touched.
 */
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

/** Bits of an index resolved by the lookup table (a 4096-entry table). */
export const DIAGONAL_LOW_BITS = 12;

/** The lookup of the target bits below DIAGONAL_LOW_BITS: entry i is the table index they give. */
export function diagonalLowLookup(targets: Int32Array): Int32Array {
  return Int32Array.from({ length: 2 ** DIAGONAL_LOW_BITS }, (_, i) => {
    let index = 0;
    targets.forEach((t, k) => {
      if (t < DIAGONAL_LOW_BITS) index |= ((i >>> t) & 1) << k;
    });
    return index;
  });
}

/** `table`: interleaved (re, im) entries, one per local target index (local bit k = targets[k]). */
export function applyDiagonalTable(
  re: Float64Array, im: Float64Array, pattern: IndexPattern, targets: Int32Array, low: Int32Array, table: Float64Array,
  from = 0, to = pattern.outer * pattern.run,
): void {
  const { positions, value, run } = pattern;
  const lowMask = 2 ** DIAGONAL_LOW_BITS - 1;
  for (let x = from; x < to;) {
    const offset = x & (run - 1);
    const length = Math.min(run - offset, to - x);
    let i = (deposit(x - offset, positions) | value) + offset;
    const end = i + length;
    x += length;
    while (i < end) {
      const blockEnd = Math.min(end, (Math.floor(i / (lowMask + 1)) + 1) * (lowMask + 1));
      let high = 0;
      for (let k = 0; k < targets.length; k++) {
        const t = targets[k]!;
        if (t >= DIAGONAL_LOW_BITS) high |= ((i >>> t) & 1) << k;
      }
      for (; i < blockEnd; i++) {
        const e = 2 * (high | low[i & lowMask]!);
        const fr = table[e]!;
        const fi = table[e + 1]!;
        const ar = re[i]!;
        const ai = im[i]!;
        re[i] = fr * ar - fi * ai;
        im[i] = fr * ai + fi * ar;
      }
    }
  }
}
