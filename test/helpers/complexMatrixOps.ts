// Dense complex-matrix arithmetic for tests: product, difference, conjugate transpose, from real/complex rows.
import type { ComplexMatrix } from '../../src/model/FermionModel.js';

export function matMul(a: ComplexMatrix, b: ComplexMatrix): ComplexMatrix {
  const n = a.n;
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

/** a + s·b for real s. */
export function matAdd(a: ComplexMatrix, b: ComplexMatrix, s = 1): ComplexMatrix {
  return { n: a.n, re: a.re.map((v, e) => v + s * b.re[e]!), im: a.im.map((v, e) => v + s * b.im[e]!) };
}

export function conjTranspose(a: ComplexMatrix): ComplexMatrix {
  const n = a.n;
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      re[j * n + i] = a.re[i * n + j]!;
      im[j * n + i] = -a.im[i * n + j]!;
    }
  }
  return { n, re, im };
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
