// adjointMatrix: the conjugate transpose a† of a dense complex matrix.
import type { ComplexMatrix } from './ComplexMatrix.js';

/** The conjugate transpose: (a†)_ij = conj(a_ji). */
export function adjointMatrix(a: ComplexMatrix): ComplexMatrix {
  const n = a.n;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      re[j * n + i] = a.re[i * n + j]!;
      im[j * n + i] = -a.im[i * n + j]!;
    }
  }
  return { n, re, im };
}
