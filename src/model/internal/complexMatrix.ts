// Small helpers for the dense ComplexMatrix of FermionModel.
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';

export function zeroComplexMatrix(n: number): ComplexMatrix {
  return { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
}

/** Adds re + i·im to entry (i, j) in place. */
export function addToEntry(m: ComplexMatrix, i: number, j: number, re: number, im: number): void {
  m.re[i * m.n + j]! += re;
  m.im[i * m.n + j]! += im;
}
