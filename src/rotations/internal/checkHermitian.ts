// checkHermitian: the shared RangeError checks of the diagonalisers for a one-body matrix T (square, finite, Hermitian).
import { hermiticityError } from '../../linalg/hermiticityError.js';
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';

/** Throws a RangeError starting with `caller` unless T is square, finite and Hermitian within tolerance · max(1, max |T_ij|). */
export function checkHermitian(T: ComplexMatrix, tolerance: number, caller: string): void {
  if (!Number.isInteger(T.n) || T.n < 0 || T.re.length !== T.n * T.n || T.im.length !== T.n * T.n) {
    throw new RangeError(`${caller}: T must be a square n×n complex matrix`);
  }
  let scale = 0;
  for (let e = 0; e < T.n * T.n; e++) scale = Math.max(scale, Math.hypot(T.re[e]!, T.im[e]!));
  if (!Number.isFinite(scale)) throw new RangeError(`${caller}: T has non-finite entries`);
  const gap = hermiticityError(T);
  if (gap > tolerance * Math.max(1, scale)) throw new RangeError(`${caller}: T is not Hermitian (max |T_ij − conj(T_ji)| = ${gap})`);
}
