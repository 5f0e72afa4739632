// hermiticityError: how far a dense complex matrix is from Hermitian, as max |a_ij − conj(a_ji)|.
import type { ComplexMatrix } from './ComplexMatrix.js';

/** max_ij |a_ij − conj(a_ji)| (0 for an exactly Hermitian matrix; NaN entries give NaN). */
export function hermiticityError(a: ComplexMatrix): number {
  const n = a.n;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    for (let j = i; j < n; j++) {
      const gap = Math.hypot(a.re[i * n + j]! - a.re[j * n + i]!, a.im[i * n + j]! + a.im[j * n + i]!);
      if (!(gap <= worst)) worst = gap;
    }
  }
  return worst;
}
