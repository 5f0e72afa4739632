/**
 * hermitianEigen: all eigenpairs of a dense complex Hermitian matrix by the cyclic complex Jacobi
 * method (a phase rotation making a_pq real, then the real Jacobi rotation; Golub & Van Loan, Matrix Computations, ch. 8).
 */
import type { ComplexMatrix } from './ComplexMatrix.js';
import { hermiticityError } from './hermiticityError.js';

export interface HermitianEigen {
  /** Eigenvalues, ascending. */
  readonly values: Float64Array;
  /** Unitary n×n matrix whose column k is a unit eigenvector of values[k]: A = V diag(values) V†. */
  readonly vectors: ComplexMatrix;
}

export interface HermitianEigenOptions {
  /** Largest accepted max_ij |a_ij − conj(a_ji)|, relative to max(1, max_ij |a_ij|). Default 1e-10. */
  readonly tolerance?: number;
}

const MAX_SWEEPS = 60;

/**
 * Eigen-decomposition A = V diag(ε) V† of a Hermitian matrix, ε ascending. The Hermitian part
 * (A + A†)/2 is what is diagonalised.
 * @throws RangeError when A is not Hermitian within the tolerance or has non-finite entries.
 */
export function hermitianEigen(a: ComplexMatrix, options: HermitianEigenOptions = {}): HermitianEigen {
  const n = a.n;
  const tolerance = options.tolerance ?? 1e-10;
  let scale = 0;
  for (let e = 0; e < n * n; e++) scale = Math.max(scale, Math.hypot(a.re[e]!, a.im[e]!));
  if (!Number.isFinite(scale)) throw new RangeError('hermitianEigen: matrix has non-finite entries');
  const gap = hermiticityError(a);
  if (gap > tolerance * Math.max(1, scale)) throw new RangeError(`hermitianEigen: matrix is not Hermitian (max |a_ij − conj(a_ji)| = ${gap})`);
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      re[i * n + j] = (a.re[i * n + j]! + a.re[j * n + i]!) / 2;
      im[i * n + j] = (a.im[i * n + j]! - a.im[j * n + i]!) / 2;
    }
  }
  // V is kept transposed (row k of vr, vi is column k of V): its updates then run along rows, not down strided columns.
  const vr = new Float64Array(n * n);
  const vi = new Float64Array(n * n);
  for (let i = 0; i < n; i++) vr[i * n + i] = 1;
  let frobenius = 0;
  for (let e = 0; e < n * n; e++) frobenius += re[e]! ** 2 + im[e]! ** 2;
  const negligible = 1e-18 * Math.sqrt(frobenius);
  let sweeps = 0;
  while (sweepOnce(re, im, vr, vi, n, negligible)) {
    if (++sweeps > MAX_SWEEPS) throw new Error(`hermitianEigen: no convergence after ${MAX_SWEEPS} sweeps`);
  }
  return sorted(re, vr, vi, n);
}

/** One cyclic sweep over all pairs p < q; returns false when every off-diagonal entry was already negligible. */
function sweepOnce(re: Float64Array, im: Float64Array, vr: Float64Array, vi: Float64Array, n: number, negligible: number): boolean {
  let rotated = false;
  for (let p = 0; p < n - 1; p++) {
    for (let q = p + 1; q < n; q++) {
      const g = Math.hypot(re[p * n + q]!, im[p * n + q]!);
      if (g <= negligible) {
        re[p * n + q] = re[q * n + p] = im[p * n + q] = im[q * n + p] = 0;
        continue;
      }
      rotated = true;
      rotate(re, im, vr, vi, n, p, q, g);
    }
  }
  return rotated;
}

/**
 * A ← J† A J, V ← V J (V stored transposed) with J = diag(1, e^{−iφ}) · [[c, s], [−s, c]] on (p, q), φ = arg a_pq:
 * the phase makes a_pq real (= g), the real rotation then zeroes it.
 */
function rotate(re: Float64Array, im: Float64Array, vr: Float64Array, vi: Float64Array, n: number, p: number, q: number, g: number): void {
  const er = re[p * n + q]! / g; // e^{iφ}
  const ei = im[p * n + q]! / g;
  const app = re[p * n + p]!;
  const aqq = re[q * n + q]!;
  const theta = (aqq - app) / (2 * g);
  const t = Math.abs(theta) > 1e150 ? 1 / (2 * theta) : Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
  const c = 1 / Math.sqrt(t * t + 1);
  const s = t * c;
  // J_qp = −s e^{−iφ}, J_qq = c e^{−iφ}.
  const qpr = -s * er;
  const qpi = s * ei;
  const qqr = c * er;
  const qqi = -c * ei;
  // Columns p, q of A, and of V (rows p, q of its transpose).
  timesJ(re, im, p, q, n, n, c, s, qpr, qpi, qqr, qqi);
  timesJ(vr, vi, p * n, q * n, 1, n, c, s, qpr, qpi, qqr, qqi);
  for (let r = 0; r < n; r++) {
    const ar = re[p * n + r]!;
    const ai = im[p * n + r]!;
    const br = re[q * n + r]!;
    const bi = im[q * n + r]!;
    // Rows p, q of J†: (c, conj J_qp) and (s, conj J_qq).
    re[p * n + r] = c * ar + br * qpr + bi * qpi;
    im[p * n + r] = c * ai + bi * qpr - br * qpi;
    re[q * n + r] = s * ar + br * qqr + bi * qqi;
    im[q * n + r] = s * ai + bi * qqr - br * qqi;
  }
  re[p * n + p] = app - t * g;
  re[q * n + q] = aqq + t * g;
  im[p * n + p] = im[q * n + q] = 0;
  re[p * n + q] = re[q * n + p] = im[p * n + q] = im[q * n + p] = 0;
}

/**
 * The pair of vectors x (entries first + k·stride) and y (second + k·stride), k < n, replaced by x·J_pp + y·J_qp and
 * x·J_pq + y·J_qq, J_pp = c, J_pq = s and J_qp = qpr + i·qpi, J_qq = qqr + i·qqi: two columns of a matrix times J.
 */
function timesJ(
  re: Float64Array, im: Float64Array, first: number, second: number, stride: number, n: number,
  c: number, s: number, qpr: number, qpi: number, qqr: number, qqi: number,
): void {
  for (let k = 0; k < n; k++) {
    const x = first + k * stride;
    const y = second + k * stride;
    const ar = re[x]!;
    const ai = im[x]!;
    const br = re[y]!;
    const bi = im[y]!;
    re[x] = c * ar + br * qpr - bi * qpi;
    im[x] = c * ai + br * qpi + bi * qpr;
    re[y] = s * ar + br * qqr - bi * qqi;
    im[y] = s * ai + br * qqi + bi * qqr;
  }
}

function sorted(re: Float64Array, vr: Float64Array, vi: Float64Array, n: number): HermitianEigen {
  const order = Array.from({ length: n }, (_, k) => k).sort((x, y) => re[x * n + x]! - re[y * n + y]! || x - y);
  const values = Float64Array.from(order, (k) => re[k * n + k]!);
  const outRe = new Float64Array(n * n);
  const outIm = new Float64Array(n * n);
  order.forEach((k, col) => {
    for (let r = 0; r < n; r++) {
      outRe[r * n + col] = vr[k * n + r]!;
      outIm[r * n + col] = vi[k * n + r]!;
    }
  });
  return { values, vectors: { n, re: outRe, im: outIm } };
}
