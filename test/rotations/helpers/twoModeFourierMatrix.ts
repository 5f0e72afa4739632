// Test-only reference: the two-mode fermionic Fourier gate F2 as a 4×4 matrix in the basis |00>, |01>, |10>, |11> (|n_1 n_0>).
import { matrixFromRows } from '../../helpers/complexMatrixOps.js';

/** F2 of Verstraete, Cirac & Latorre, Phys. Rev. A 79, 032316, 2009 (from memory): one-particle (1/√2)[[1, 1], [1, −1]], |11> → −|11>. */
export const TWO_MODE_FOURIER_MATRIX = matrixFromRows([
  [1, 0, 0, 0],
  [0, Math.SQRT1_2, Math.SQRT1_2, 0],
  [0, Math.SQRT1_2, -Math.SQRT1_2, 0],
  [0, 0, 0, -1],
]);
