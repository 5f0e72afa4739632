// diagonalizeOneBody: the sorted single-particle energies ε and orbitals V of a Hermitian one-body matrix, T = V diag(ε) V†.
import { hermitianEigen } from '../linalg/hermitianEigen.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { checkHermitian } from './internal/checkHermitian.js';

export interface OneBodyDiagonalization {
  /** Single-particle energies, ascending. */
  readonly energies: Float64Array;
  /** Unitary; column k is the orbital of energies[k]: T = V diag(ε) V†. */
  readonly V: ComplexMatrix;
}

export interface DiagonalizeOneBodyOptions {
  /** Largest accepted max |T_ij − conj(T_ji)|, relative to max(1, max |T_ij|). Default 1e-10. */
  readonly tolerance?: number;
}

/**
 * Eigen-decomposition of the one-body matrix T of H₁ = Σ_ij T_ij a_i† a_j (complex Jacobi, see hermitianEigen):
 * with b_k† = Σ_j V_jk a_j†, H₁ = Σ_k ε_k b_k† b_k (Szabo & Ostlund, Modern Quantum Chemistry, 1989, ch. 3).
 * Degenerate levels get an arbitrary orthonormal basis of their eigenspace.
 * @throws RangeError when T is not square, finite and Hermitian within the tolerance.
 */
export function diagonalizeOneBody(T: ComplexMatrix, options: DiagonalizeOneBodyOptions = {}): OneBodyDiagonalization {
  const tolerance = options.tolerance ?? 1e-10;
  checkHermitian(T, tolerance, 'diagonalizeOneBody');
  const { values, vectors } = hermitianEigen(T, { tolerance });
  return { energies: values, V: vectors };
}
