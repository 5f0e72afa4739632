/**
 * Single-qubit measurement helpers on unnormalised states: the weight of the |1> half, projecting
 * onto one value, moving the |1> half onto |0> (the flip of a reset), and rescaling.
 */
import type { StateVector } from '../StateVector.js';

/** Σ |amplitude|² over the indices with bit `qubit` = 1. */
export function weightOfOne(state: StateVector, qubit: number): number {
  const { re, im } = state;
  const bit = 1 << qubit;
  let sum = 0;
  for (let base = bit; base < re.length; base += 2 * bit) {
    for (let i = base; i < base + bit; i++) sum += re[i]! * re[i]! + im[i]! * im[i]!;
  }
  return sum;
}

/** Sets to zero the amplitudes whose bit `qubit` differs from `value`. */
export function project(state: StateVector, qubit: number, value: 0 | 1): void {
  const { re, im } = state;
  const bit = 1 << qubit;
  for (let base = value === 1 ? 0 : bit; base < re.length; base += 2 * bit) {
    re.fill(0, base, base + bit);
    im.fill(0, base, base + bit);
  }
}

/** Moves the bit-`qubit` = 1 amplitudes onto their bit = 0 partners (overwriting them) and zeroes the rest. */
export function moveOneToZero(state: StateVector, qubit: number): void {
  const { re, im } = state;
  const bit = 1 << qubit;
  for (let base = 0; base < re.length; base += 2 * bit) {
    re.copyWithin(base, base + bit, base + 2 * bit);
    im.copyWithin(base, base + bit, base + 2 * bit);
    re.fill(0, base + bit, base + 2 * bit);
    im.fill(0, base + bit, base + 2 * bit);
  }
}

/** Multiplies every amplitude by the real factor `factor`. */
export function scale(state: StateVector, factor: number): void {
  const { re, im } = state;
  for (let i = 0; i < re.length; i++) {
    re[i] = re[i]! * factor;
    im[i] = im[i]! * factor;
  }
}
