/**
 * allocateAmplitudes: the real and imaginary arrays of a state. The imaginary array starts 64
 * doubles into a slightly larger buffer: two separately allocated large arrays land at addresses
 * equal modulo big powers of two, so re[i] and im[i] compete for the same cache sets and the pair
 * loops run 2–3× slower than a copy (measured with scripts/bench-sim.ts at 24 qubits).
 */

const IMAGINARY_OFFSET = 64;

/** Extra bytes beyond 16·size that allocateAmplitudes uses. */
export const AMPLITUDE_PADDING_BYTES = 8 * IMAGINARY_OFFSET;

export function allocateAmplitudes(size: number): [Float64Array, Float64Array] {
  const re = new Float64Array(size);
  const im = new Float64Array(size + IMAGINARY_OFFSET).subarray(IMAGINARY_OFFSET);
  return [re, im];
}
