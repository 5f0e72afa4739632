// unitarityError: how far a dense complex matrix is from unitary, as max |(a†a − I)_ij|.
import type { ComplexMatrix } from './ComplexMatrix.js';

/** max_ij |(a†a − I)_ij| (0 for an exactly unitary matrix; NaN entries give NaN). */
export function unitarityError(a: ComplexMatrix): number {
  const n = a.n;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let sr = i === j ? -1 : 0;
      let si = 0;
      for (let k = 0; k < n; k++) {
        // conj(a_ki) · a_kj
        const xr = a.re[k * n + i]!;
        const xi = a.im[k * n + i]!;
        const yr = a.re[k * n + j]!;
        const yi = a.im[k * n + j]!;
        sr += xr * yr + xi * yi;
        si += xr * yi - xi * yr;
      }
      const gap = Math.hypot(sr, si);
      if (!(gap <= worst)) worst = gap;
    }
  }
  return worst;
}
