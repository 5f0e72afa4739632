/**
 * applySwapPairs: swap (or swap to a power) of qubits a and b over the indices of an IndexPattern
 * that fixes a = 1, b = 0 (plus any controls); each is paired with the index that has a = 0, b = 1.
 * On span{|a=1,b=0>, |a=0,b=1>} the powered swap is [[p, q], [q, p]], p = (1+e)/2, q = (1−e)/2.
 */
import { deposit, type IndexPattern } from '../internal/indexPattern.js';

export function applySwapPairs(
  re: Float64Array, im: Float64Array, pattern: IndexPattern, bitA: number, bitB: number,
  phaseRe: number, phaseIm: number,
  from = 0, to = pattern.outer * pattern.run,
): void {
  const { positions, value, run } = pattern;
  const exact = phaseRe === -1 && phaseIm === 0;
  const pr = (1 + phaseRe) / 2;
  const pi = phaseIm / 2;
  const qr = (1 - phaseRe) / 2;
  const qi = -phaseIm / 2;
  const shift = bitB - bitA;
  for (let x = from; x < to;) {
    const offset = x & (run - 1);
    const length = Math.min(run - offset, to - x);
    const start = (deposit(x - offset, positions) | value) + offset;
    const end = start + length;
    x += length;
    for (let i = start; i < end; i++) {
      const j = i + shift;
      const xr = re[i]!;
      const xi = im[i]!;
      const yr = re[j]!;
      const yi = im[j]!;
      if (exact) {
        re[i] = yr;
        im[i] = yi;
        re[j] = xr;
        im[j] = xi;
      } else {
        re[i] = pr * xr - pi * xi + qr * yr - qi * yi;
        im[i] = pr * xi + pi * xr + qr * yi + qi * yr;
        re[j] = qr * xr - qi * xi + pr * yr - pi * yi;
        im[j] = qr * xi + qi * xr + pr * yi + pi * yr;
      }
    }
  }
}
