/**
 * allocateAmplitudes: a state's re and im arrays, im offset 64 doubles into its buffer so that re[i] and im[i]
 * do not share cache sets (separate large arrays alias; pair loops then ran 2–4× a copy at 24 qubits).
 * From PARALLEL_MIN_AMPLITUDES on, the buffers are SharedArrayBuffers, so a SimulatorPool can work on them.
 */
import { PARALLEL_MIN_AMPLITUDES } from '../SimulatorPool.js';

const IMAGINARY_OFFSET = 64;

/** Extra bytes beyond 16·size that allocateAmplitudes uses. */
export const AMPLITUDE_PADDING_BYTES = 8 * IMAGINARY_OFFSET;

export function allocateAmplitudes(size: number): [Float64Array, Float64Array] {
  const shared = size >= PARALLEL_MIN_AMPLITUDES;
  const buffer = (doubles: number): ArrayBuffer | SharedArrayBuffer => (shared ? new SharedArrayBuffer(8 * doubles) : new ArrayBuffer(8 * doubles));
  const re = new Float64Array(buffer(size));
  const im = new Float64Array(buffer(size + IMAGINARY_OFFSET)).subarray(IMAGINARY_OFFSET);
  return [re, im];
}
