/**
 * sectorResolvent: the reference P (w − A)⁻¹ P for a dense Fock-space operator A that conserves the electron number and
 * P the projector onto the electron numbers in [min, max] — each sector's block of w − A inverted by Gauss–Jordan
 * elimination with partial pivoting (a route independent of the fast inverse's eigen-decomposition).
 */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { zeroMatrix } from '../../linalg/zeroMatrix.js';
import { popcount32 } from '../../operators/internal/popcount.js';


/** In-place inverse of the d×d complex matrix (re, im); returns it. */
function invert(re: Float64Array, im: Float64Array, d: number): { re: Float64Array; im: Float64Array } {
  const ir = new Float64Array(d * d);
  const ii = new Float64Array(d * d);
  for (let k = 0; k < d; k++) ir[k * d + k] = 1;
  const rows = [re, im, ir, ii];
  for (let c = 0; c < d; c++) {
    let p = c;
    for (let r = c + 1; r < d; r++) if (Math.hypot(re[r * d + c]!, im[r * d + c]!) > Math.hypot(re[p * d + c]!, im[p * d + c]!)) p = r;
    if (p !== c) {
      for (const x of rows) for (let k = 0; k < d; k++) [x[c * d + k], x[p * d + k]] = [x[p * d + k]!, x[c * d + k]!];
    }
    const den = re[c * d + c]! ** 2 + im[c * d + c]! ** 2;
    if (den === 0) throw new RangeError('sectorResolvent: w − A is singular on a sector');
    const pr = re[c * d + c]! / den;
    const pi = -im[c * d + c]! / den;
    for (const [xr, xi] of [[re, im], [ir, ii]] as const) {
      for (let k = 0; k < d; k++) {
        const a = xr[c * d + k]!;
        const b = xi[c * d + k]!;
        xr[c * d + k] = a * pr - b * pi;
        xi[c * d + k] = a * pi + b * pr;
      }
    }
    for (let r = 0; r < d; r++) {
      const fr = re[r * d + c]!;
      const fi = im[r * d + c]!;
      if (r === c || (fr === 0 && fi === 0)) continue;
      for (const [xr, xi] of [[re, im], [ir, ii]] as const) {
        for (let k = 0; k < d; k++) {
          const a = xr[c * d + k]!;
          const b = xi[c * d + k]!;
          xr[r * d + k] = xr[r * d + k]! - (fr * a - fi * b);
          xi[r * d + k] = xi[r * d + k]! - (fr * b + fi * a);
        }
      }
    }
  }
  return { re: ir, im: ii };
}

export function sectorResolvent(A: ComplexMatrix, w: ComplexScalar, window: { readonly min: number; readonly max: number }): ComplexMatrix {
  const dim = A.n;
  const out = zeroMatrix(dim);
  for (let N = window.min; N <= window.max; N++) {
    const basis = Array.from({ length: dim }, (_, s) => s).filter((s) => popcount32(s) === N);
    const d = basis.length;
    const re = new Float64Array(d * d);
    const im = new Float64Array(d * d);
    basis.forEach((r, a) =>
      basis.forEach((s, b) => {
        re[a * d + b] = (a === b ? w.re : 0) - A.re[r * dim + s]!;
        im[a * d + b] = (a === b ? w.im : 0) - A.im[r * dim + s]!;
      }),
    );
    const inverse = invert(re, im, d);
    basis.forEach((r, a) =>
      basis.forEach((s, b) => {
        out.re[r * dim + s] = inverse.re[a * d + b]!;
        out.im[r * dim + s] = inverse.im[a * d + b]!;
      }),
    );
  }
  return out;
}
