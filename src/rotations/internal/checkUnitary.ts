// checkUnitary: the shared RangeError checks of the rotation builders for an orbital matrix V (square, finite, unitary).
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import { unitarityError } from '../../linalg/unitarityError.js';

/** Throws a RangeError starting with `caller` unless V is an n×n unitary within `tolerance` (max |(V†V − I)_ij|). */
export function checkUnitary(V: ComplexMatrix, tolerance: number, caller: string): void {
  if (!Number.isInteger(V.n) || V.n < 0 || V.re.length !== V.n * V.n || V.im.length !== V.n * V.n) {
    throw new RangeError(`${caller}: V must be a square n×n complex matrix`);
  }
  const error = unitarityError(V);
  if (!(error <= tolerance)) throw new RangeError(`${caller}: V is not unitary (max |(V†V − I)_ij| = ${error} > ${tolerance})`);
}
