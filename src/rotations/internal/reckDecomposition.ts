/**
 * reckDecomposition: factors a unitary u as G_1† ⋯ G_L† D (L = n(n−1)/2 adjacent-row SU(2) rotations, D diagonal)
 * by nulling the below-diagonal entries column by column from the bottom (Reck et al., Phys. Rev. Lett. 73, 58, 1994).
 */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import { nullByRows, su2Factor, type TwoModeFactor, type TwoModeFactors } from './twoModeFactors.js';

/** The triangular-arrangement factors of a unitary u (not checked here); 2n − 3 rotation layers. */
export function reckDecomposition(u: ComplexMatrix): TwoModeFactors {
  const n = u.n;
  const re = Float64Array.from(u.re);
  const im = Float64Array.from(u.im);
  const nulling: TwoModeFactor[] = [];
  for (let c = 0; c < n - 1; c++) {
    for (let r = n - 1; r > c; r--) {
      const ar = re[(r - 1) * n + c]!;
      const ai = im[(r - 1) * n + c]!;
      const br = re[r * n + c]!;
      const bi = im[r * n + c]!;
      const rho = Math.hypot(ar, ai, br, bi);
      if (rho === 0) {
        nulling.push({ mode: r - 1, theta: 0, psi: 0, chi: 0 });
        continue;
      }
      nullByRows(re, im, n, r, ar / rho, ai / rho, br / rho, bi / rho);
      nulling.push(su2Factor(r - 1, ar / rho, ai / rho, br / rho, bi / rho));
    }
  }
  // G_L ⋯ G_1 u = D is now diagonal; the circuit applies D, then G_L†, …, G_1†.
  const phases = Float64Array.from({ length: n }, (_, k) => Math.atan2(im[k * n + k]!, re[k * n + k]!));
  return { phases, rotations: nulling.reverse() };
}
