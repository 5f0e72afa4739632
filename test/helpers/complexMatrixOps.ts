// Dense complex-matrix arithmetic for tests: product, difference, conjugate transpose, from real/complex rows.
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';

// Products and adjoints come from src/linalg, whose own tests check them against hand-worked values.
export { matrixMultiply as matMul } from '../../src/linalg/matrixMultiply.js';
export { adjointMatrix as conjTranspose } from '../../src/linalg/adjointMatrix.js';

/** a + s·b for real s. */
export function matAdd(a: ComplexMatrix, b: ComplexMatrix, s = 1): ComplexMatrix {
  return { n: a.n, re: a.re.map((v, e) => v + s * b.re[e]!), im: a.im.map((v, e) => v + s * b.im[e]!) };
}

/** A ComplexMatrix from rows of real numbers or [re, im] pairs. */
export function matrixFromRows(rows: readonly (readonly (number | readonly [number, number])[])[]): ComplexMatrix {
  const n = rows.length;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  rows.forEach((row, i) =>
    row.forEach((v, j) => {
      re[i * n + j] = typeof v === 'number' ? v : v[0];
      im[i * n + j] = typeof v === 'number' ? 0 : v[1];
    }),
  );
  return { n, re, im };
}

/** The n×n block of rows/columns `modes` of a matrix. */
export function subMatrix(a: ComplexMatrix, modes: readonly number[]): ComplexMatrix {
  const m = modes.length;
  const re = new Float64Array(m * m);
  const im = new Float64Array(m * m);
  modes.forEach((r, i) =>
    modes.forEach((c, j) => {
      re[i * m + j] = a.re[r * a.n + c]!;
      im[i * m + j] = a.im[r * a.n + c]!;
    }),
  );
  return { n: m, re, im };
}
