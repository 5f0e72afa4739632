// matrixMultiply: the product a·b of two dense complex n×n matrices.
import type { ComplexMatrix } from './ComplexMatrix.js';

/**
 * The product a·b (row-major, entry (i, j) at i·n + j).
 * @throws RangeError when the sizes differ.
 */
export function matrixMultiply(a: ComplexMatrix, b: ComplexMatrix): ComplexMatrix {
  const n = a.n;
  if (b.n !== n) throw new RangeError(`matrixMultiply: sizes ${a.n} and ${b.n} differ`);
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < n; k++) {
      const ar = a.re[i * n + k]!;
      const ai = a.im[i * n + k]!;
      if (ar === 0 && ai === 0) continue;
      for (let j = 0; j < n; j++) {
        re[i * n + j]! += ar * b.re[k * n + j]! - ai * b.im[k * n + j]!;
        im[i * n + j]! += ar * b.im[k * n + j]! + ai * b.re[k * n + j]!;
      }
    }
  }
  return { n, re, im };
}
