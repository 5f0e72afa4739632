// identityMatrix: the n×n identity matrix.
import type { ComplexMatrix } from './ComplexMatrix.js';
import { zeroMatrix } from './zeroMatrix.js';

export function identityMatrix(n: number): ComplexMatrix {
  const m = zeroMatrix(n);
  for (let k = 0; k < n; k++) m.re[k * n + k] = 1;
  return m;
}
