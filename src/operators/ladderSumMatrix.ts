// ladderSumMatrix: the dense matrix of a LadderSum on the 2^n Fock space (n ≤ 12) by bit manipulation:
// a_j|s> = (−1)^{#occupied modes below j} |s with bit j cleared> when bit j is set, else 0; a_j† likewise.
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { LadderSum } from './LadderSum.js';
import { popcount32 } from './internal/popcount.js';

/** Largest mode count ladderSumMatrix accepts. */
export const MAX_DENSE_MODES = 12;

/**
 * Basis index s has bit j set when mode j is occupied (the same little-endian order as pauliSumMatrix), so
 * this is an independent route to jordanWigner's matrix.
 * @throws RangeError when modes > 12 or a mode of `op` is ≥ modes.
 */
export function ladderSumMatrix(op: LadderSum, modes: number): ComplexMatrix {
  if (modes > MAX_DENSE_MODES) throw new RangeError(`ladderSumMatrix: ${modes} modes > ${MAX_DENSE_MODES}`);
  const dim = 1 << modes;
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (const term of op.terms) {
    const factors = Int32Array.from(term.ops, (o) => {
      if (o.mode >= modes) throw new RangeError(`ladderSumMatrix: mode ${o.mode} ≥ modes ${modes}`);
      return 2 * o.mode + (o.dagger ? 1 : 0);
    });
    for (let c = 0; c < dim; c++) {
      let s = c;
      let sign = 1;
      let alive = true;
      for (let f = factors.length - 1; f >= 0 && alive; f--) {
        const bit = 1 << (factors[f]! >> 1);
        const occupied = (s & bit) !== 0;
        if (occupied === ((factors[f]! & 1) === 1)) alive = false;
        else {
          if ((popcount32(s & (bit - 1)) & 1) === 1) sign = -sign;
          s ^= bit;
        }
      }
      if (!alive) continue;
      re[s * dim + c]! += sign * term.re;
      im[s * dim + c]! += sign * term.im;
    }
  }
  return { n: dim, re, im };
}
