/**
 * randomUnitVector: a uniformly random complex unit vector from a seeded stream — Gaussian amplitudes by Box–Muller,
 * normalised (common practice) — written into given arrays or new ones; indices with a bit of `zeroMask` set stay 0,
 * so a register can be held at |0>.
 */
import type { RandomSource } from './seededRandom.js';

export interface ComplexArrays {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

export function randomUnitVector(
  dim: number,
  random: RandomSource,
  zeroMask = 0,
  into: ComplexArrays = { re: new Float64Array(dim), im: new Float64Array(dim) },
): ComplexArrays {
  const { re, im } = into;
  let norm = 0;
  for (let k = 0; k < dim; k++) {
    if ((k & zeroMask) !== 0) {
      re[k] = 0;
      im[k] = 0;
      continue;
    }
    const r = Math.sqrt(-2 * Math.log(1 - random.next()));
    const t = 2 * Math.PI * random.next();
    re[k] = r * Math.cos(t);
    im[k] = r * Math.sin(t);
    norm += r * r;
  }
  const scale = 1 / Math.sqrt(norm);
  for (let k = 0; k < dim; k++) {
    re[k] = re[k]! * scale;
    im[k] = im[k]! * scale;
  }
  return into;
}
