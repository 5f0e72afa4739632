// fourierMatrix: the unitary discrete Fourier matrix F_jk = e^{2πi jk/n}/√n, the orbital matrix of the fermionic Fourier transform.
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';

/**
 * F_jk = e^{2πi jk/n}/√n. Its columns are the plane waves that diagonalise any n×n circulant matrix
 * (Davis, Circulant Matrices, 1979).
 * @throws RangeError when n is not a positive integer.
 */
export function fourierMatrix(n: number): ComplexMatrix {
  if (!Number.isInteger(n) || n < 1) throw new RangeError(`fourierMatrix: n = ${n} is not a positive integer`);
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  const norm = 1 / Math.sqrt(n);
  for (let j = 0; j < n; j++) {
    for (let k = 0; k < n; k++) {
      // jk mod n keeps the angle in [0, 2π) so large n loses no accuracy.
      const angle = (2 * Math.PI * ((j * k) % n)) / n;
      re[j * n + k] = norm * Math.cos(angle);
      im[j * n + k] = norm * Math.sin(angle);
    }
  }
  return { n, re, im };
}
