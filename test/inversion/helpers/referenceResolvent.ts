// Test-only reference for the fast inverse: P (w − A)⁻¹ P from A's Jordan–Wigner Pauli matrix, inverted by Gauss–Jordan
// elimination, and random Hermitian one-body matrices with prescribed (e.g. dyadic) spectra.
import fc from 'fast-check';
import type { ComplexMatrix } from '../../../src/linalg/ComplexMatrix.js';
import { jordanWigner } from '../../../src/operators/jordanWigner.js';
import { modelHamiltonian } from '../../../src/operators/modelHamiltonian.js';
import { pauliSumMatrix } from '../../../src/operators/pauliSumMatrix.js';
import { quadraticModel } from '../../helpers/models.js';

const popcount = (x: number): number => (x === 0 ? 0 : (x & 1) + popcount(x >>> 1));

function invert(a: ComplexMatrix): ComplexMatrix {
  const n = a.n;
  const re = Float64Array.from(a.re);
  const im = Float64Array.from(a.im);
  const ir = new Float64Array(n * n);
  const ii = new Float64Array(n * n);
  for (let k = 0; k < n; k++) ir[k * n + k] = 1;
  const swapRows = (x: Float64Array, r: number, s: number): void => {
    for (let k = 0; k < n; k++) [x[r * n + k], x[s * n + k]] = [x[s * n + k]!, x[r * n + k]!];
  };
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.hypot(re[r * n + c]!, im[r * n + c]!) > Math.hypot(re[p * n + c]!, im[p * n + c]!)) p = r;
    for (const x of [re, im, ir, ii]) swapRows(x, c, p);
    const den = re[c * n + c]! ** 2 + im[c * n + c]! ** 2;
    const pr = re[c * n + c]! / den;
    const pi = -im[c * n + c]! / den;
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      // Row r −= f · row c with f = a_rc / a_cc.
      const fr = re[r * n + c]! * pr - im[r * n + c]! * pi;
      const fi = re[r * n + c]! * pi + im[r * n + c]! * pr;
      for (const [xr, xi] of [[re, im], [ir, ii]] as const) {
        for (let k = 0; k < n; k++) {
          const cr = xr[c * n + k]!;
          const ci = xi[c * n + k]!;
          xr[r * n + k] = xr[r * n + k]! - (fr * cr - fi * ci);
          xi[r * n + k] = xi[r * n + k]! - (fr * ci + fi * cr);
        }
      }
    }
    for (const [xr, xi] of [[re, im], [ir, ii]] as const) {
      for (let k = 0; k < n; k++) {
        const cr = xr[c * n + k]!;
        const ci = xi[c * n + k]!;
        xr[c * n + k] = cr * pr - ci * pi;
        xi[c * n + k] = cr * pi + ci * pr;
      }
    }
  }
  return { n, re: ir, im: ii };
}

/** P (w − A)⁻¹ P with P the projector onto popcount ∈ [min, max] (the whole space by default). */
export function referenceResolvent(T: ComplexMatrix, w: { re: number; im: number }, window = { min: 0, max: T.n }): ComplexMatrix {
  const A = pauliSumMatrix(jordanWigner(modelHamiltonian(quadraticModel(T, 0), { part: 'A' }), T.n));
  const dim = A.n;
  const shifted = { n: dim, re: Float64Array.from(A.re, (x) => -x), im: Float64Array.from(A.im, (x) => -x) };
  for (let k = 0; k < dim; k++) {
    shifted.re[k * dim + k] = shifted.re[k * dim + k]! + w.re;
    shifted.im[k * dim + k] = shifted.im[k * dim + k]! + w.im;
  }
  const inverse = invert(shifted);
  for (let r = 0; r < dim; r++) {
    for (let s = 0; s < dim; s++) {
      const inside = [r, s].every((x) => popcount(x) >= window.min && popcount(x) <= window.max);
      if (!inside) {
        inverse.re[r * dim + s] = 0;
        inverse.im[r * dim + s] = 0;
      }
    }
  }
  return inverse;
}

/** Q diag(spectrum) Q† for a random unitary Q: Gram–Schmidt of the columns 3·e_k + (entries in [−0.5, 0.5]), well conditioned. */
export function withSpectrum(spectrum: readonly number[], entries: readonly number[]): ComplexMatrix {
  const n = spectrum.length;
  const cols: { re: number[]; im: number[] }[] = [];
  for (let k = 0; k < n; k++) {
    const v = { re: Array.from({ length: n }, (_, i) => entries[(2 * (k * n + i)) % entries.length]! / 2 + (i === k ? 3 : 0)), im: Array.from({ length: n }, (_, i) => entries[(2 * (k * n + i) + 1) % entries.length]! / 2) };
    for (const u of cols) {
      let dr = 0;
      let di = 0;
      for (let i = 0; i < n; i++) {
        dr += u.re[i]! * v.re[i]! + u.im[i]! * v.im[i]!;
        di += u.re[i]! * v.im[i]! - u.im[i]! * v.re[i]!;
      }
      for (let i = 0; i < n; i++) {
        v.re[i] = v.re[i]! - (dr * u.re[i]! - di * u.im[i]!);
        v.im[i] = v.im[i]! - (dr * u.im[i]! + di * u.re[i]!);
      }
    }
    const norm = Math.sqrt(v.re.reduce((s, x, i) => s + x * x + v.im[i]! ** 2, 0));
    cols.push({ re: v.re.map((x) => x / norm), im: v.im.map((x) => x / norm) });
  }
  const T = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      for (let k = 0; k < n; k++) {
        const a = { re: cols[k]!.re[i]!, im: cols[k]!.im[i]! };
        const b = { re: cols[k]!.re[j]!, im: -cols[k]!.im[j]! };
        T.re[i * n + j] = T.re[i * n + j]! + spectrum[k]! * (a.re * b.re - a.im * b.im);
        T.im[i * n + j] = T.im[i * n + j]! + spectrum[k]! * (a.re * b.im + a.im * b.re);
      }
    }
  }
  return T;
}

/** A random Hermitian n×n matrix with entries in [−scale, scale], those below 1e-6 in size set to 0 (no subnormals). */
export const hermitianArb = (n: number, scale = 1): fc.Arbitrary<ComplexMatrix> =>
  fc.array(fc.double({ min: -scale, max: scale, noNaN: true }).map((x) => (Math.abs(x) < 1e-6 ? 0 : x)), { minLength: 2 * n * n, maxLength: 2 * n * n }).map((x) => {
    const T = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
    for (let i = 0; i < n; i++) {
      T.re[i * n + i] = x[i * n + i]!;
      for (let j = i + 1; j < n; j++) {
        T.re[i * n + j] = T.re[j * n + i] = x[i * n + j]!;
        T.im[i * n + j] = x[n * n + i * n + j]!;
        T.im[j * n + i] = -x[n * n + i * n + j]!;
      }
    }
    return T;
  });
