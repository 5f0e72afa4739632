// zeroMatrix: the n×n zero matrix.
import type { ComplexMatrix } from './ComplexMatrix.js';

export function zeroMatrix(n: number): ComplexMatrix {
  return { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
}
