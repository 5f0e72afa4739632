/**
 * allocateAmplitudes: a state's re and im arrays, im offset 64 doubles into its buffer so that re[i] and im[i]
 * do not share cache sets (separate large arrays alias; pair loops then ran 2–4× a copy at 24 qubits).
 */

const IMAGINARY_OFFSET = 64;

/** Extra bytes beyond 16·size that allocateAmplitudes uses. */
export const AMPLITUDE_PADDING_BYTES = 8 * IMAGINARY_OFFSET;

export function allocateAmplitudes(size: number): [Float64Array, Float64Array] {
  const re = new Float64Array(size);
  const im = new Float64Array(size + IMAGINARY_OFFSET).subarray(IMAGINARY_OFFSET);
  return [re, im];
}
