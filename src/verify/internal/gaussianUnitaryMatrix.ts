/**
 * gaussianUnitaryMatrix: the Fock-space matrix of the number-conserving fermionic Gaussian unitary with
 * one-particle matrix u and fixed vacuum: <T|U|S> = det u[T, S] for occupation sets of equal size, where
 * |S> = a†_{s1} ⋯ a†_{sk} |vac> (s1 < … < sk) is the basis state with those bits set under Jordan–Wigner.
 */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import { determinant } from './determinant.js';

function bitsOf(mask: number, n: number): number[] {
  const bits: number[] = [];
  for (let q = 0; q < n; q++) if ((mask >> q) & 1) bits.push(q);
  return bits;
}

/** Minor det u[rows, cols]. */
export function minor(u: ComplexMatrix, rows: readonly number[], cols: readonly number[]): [number, number] {
  const k = rows.length;
  const re = new Float64Array(k * k);
  const im = new Float64Array(k * k);
  rows.forEach((r, a) => cols.forEach((c, b) => {
    re[a * k + b] = u.re[r * u.n + c]!;
    im[a * k + b] = u.im[r * u.n + c]!;
  }));
  return k === 0 ? [1, 0] : determinant(re, im, k);
}

export function gaussianUnitaryMatrix(u: ComplexMatrix): ComplexMatrix {
  const n = u.n;
  const dim = 2 ** n;
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  const bits = Array.from({ length: dim }, (_, m) => bitsOf(m, n));
  for (let s = 0; s < dim; s++) {
    for (let t = 0; t < dim; t++) {
      if (bits[t]!.length !== bits[s]!.length) continue;
      const [r, i] = minor(u, bits[t]!, bits[s]!);
      re[t * dim + s] = r;
      im[t * dim + s] = i;
    }
  }
  return { n: dim, re, im };
}
