/**
 * selfEnergyBound: a bound on how far Σ(z) = (z − T) − G(z)⁻¹ can be from the self-energy of the
 * exact G when G is known entry by entry to within `entryBounds`: with E = G_exact − G,
 *   ‖δΣ‖ = ‖(G + E)⁻¹ − G⁻¹‖ ≤ ‖G⁻¹‖² ‖E‖ / (1 − ‖G⁻¹‖ ‖E‖)   when ‖G⁻¹‖ ‖E‖ < 1
 * (perturbation of the inverse; Golub & Van Loan, Matrix Computations, 4th ed., Thm 2.3.4), in the
 * Frobenius norm (‖E‖_F ≤ √Σ b_ij²), which bounds every entry of δΣ. Infinity when the condition fails.
 * Rounding in forming G⁻¹ is not included.
 */
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { complexInverse } from './internal/complexInverse.js';

/** @param entryBounds row-major n×n bounds on |G_exact − G| entry by entry */
export function selfEnergyBound(green: ComplexMatrix, entryBounds: ArrayLike<number>): number {
  const inverse = complexInverse(green);
  let inverseNorm = 0;
  for (let k = 0; k < inverse.re.length; k++) inverseNorm += inverse.re[k]! ** 2 + inverse.im[k]! ** 2;
  inverseNorm = Math.sqrt(inverseNorm);
  let errorNorm = 0;
  for (let k = 0; k < entryBounds.length; k++) errorNorm += entryBounds[k]! ** 2;
  errorNorm = Math.sqrt(errorNorm);
  const product = inverseNorm * errorNorm;
  if (errorNorm === 0) return 0;
  return product < 1 ? (inverseNorm * product) / (1 - product) : Number.POSITIVE_INFINITY;
}
