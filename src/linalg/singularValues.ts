/**
 * singularValues: the singular value decomposition M = U diag(σ) V† of a dense complex square matrix,
 * σ descending, by the one-sided (Hestenes) Jacobi method: unitary plane rotations on the right
 * orthogonalise the columns of M V, whose norms are then σ and whose directions are U's columns
 * (Hestenes, J. SIAM 6, 51 (1958); Demmel & Veselić, SIAM J. Matrix Anal. Appl. 13, 1204 (1992), which
 * shows the method's high relative accuracy). Columns are stored contiguously while rotating.
 */
import type { ComplexMatrix } from './ComplexMatrix.js';

export interface SingularValueDecomposition {
  /** Unitary; column k is the left singular vector of sigma[k]. */
  readonly U: ComplexMatrix;
  /** Descending, ≥ 0. */
  readonly sigma: Float64Array;
  /** Unitary; column k is the right singular vector of sigma[k]. */
  readonly V: ComplexMatrix;
}

const MAX_SWEEPS = 80;

/**
 * @throws RangeError for non-finite entries, or when the sweeps do not converge.
 */
export function singularValueDecomposition(M: ComplexMatrix): SingularValueDecomposition {
  const n = M.n;
  // a: columns of M V, column-major; v: columns of V, column-major.
  const aRe = new Float64Array(n * n);
  const aIm = new Float64Array(n * n);
  const vRe = new Float64Array(n * n);
  const vIm = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    vRe[i * n + i] = 1;
    for (let j = 0; j < n; j++) {
      const re = M.re[i * n + j]!;
      const im = M.im[i * n + j]!;
      if (!Number.isFinite(re) || !Number.isFinite(im)) throw new RangeError(`singularValueDecomposition: entry (${i}, ${j}) is not finite`);
      aRe[j * n + i] = re;
      aIm[j * n + i] = im;
    }
  }
  // Rotations stop once every pair of columns is orthogonal to n·ε relative to their norms.
  const threshold = Math.max(1, n) * Number.EPSILON;
  let sweeps = 0;
  while (sweepOnce(aRe, aIm, vRe, vIm, n, threshold)) {
    if (++sweeps > MAX_SWEEPS) throw new RangeError(`singularValueDecomposition: no convergence after ${MAX_SWEEPS} sweeps`);
  }
  return assemble(aRe, aIm, vRe, vIm, n);
}

/** One cyclic sweep over all column pairs p < q; false when no rotation was needed. */
function sweepOnce(aRe: Float64Array, aIm: Float64Array, vRe: Float64Array, vIm: Float64Array, n: number, threshold: number): boolean {
  let rotated = false;
  for (let p = 0; p < n - 1; p++) {
    const bp = p * n;
    for (let q = p + 1; q < n; q++) {
      const bq = q * n;
      let alpha = 0;
      let beta = 0;
      let gRe = 0;
      let gIm = 0;
      for (let i = 0; i < n; i++) {
        const pr = aRe[bp + i]!;
        const pi = aIm[bp + i]!;
        const qr = aRe[bq + i]!;
        const qi = aIm[bq + i]!;
        alpha += pr * pr + pi * pi;
        beta += qr * qr + qi * qi;
        // γ = a_p† a_q
        gRe += pr * qr + pi * qi;
        gIm += pr * qi - pi * qr;
      }
      const size = Math.hypot(gRe, gIm);
      if (size === 0 || !(size > threshold * Math.sqrt(alpha * beta))) continue;
      rotated = true;
      // Real Jacobi rotation of [[α, |γ|], [|γ|, β]]: t = sign(ζ)/(|ζ| + √(1+ζ²)), ζ = (β − α)/(2|γ|).
      const zeta = (beta - alpha) / (2 * size);
      const t = (zeta >= 0 ? 1 : -1) / (Math.abs(zeta) + Math.sqrt(1 + zeta * zeta));
      const c = 1 / Math.sqrt(1 + t * t);
      const s = c * t;
      // [a_p, a_q] ← [a_p, a_q] [[c, s], [−s e^{−iθ}, c e^{−iθ}]] with e^{iθ} = γ/|γ|.
      const eRe = gRe / size;
      const eIm = -gIm / size;
      rotatePair(aRe, aIm, bp, bq, n, c, s, eRe, eIm);
      rotatePair(vRe, vIm, bp, bq, n, c, s, eRe, eIm);
    }
  }
  return rotated;
}

/** x_p ← c x_p − s e x_q, x_q ← s x_p + c e x_q for the columns starting at bp, bq (e = eRe + i eIm, |e| = 1). */
function rotatePair(re: Float64Array, im: Float64Array, bp: number, bq: number, n: number, c: number, s: number, eRe: number, eIm: number): void {
  for (let i = 0; i < n; i++) {
    const pr = re[bp + i]!;
    const pi = im[bp + i]!;
    const qr = re[bq + i]!;
    const qi = im[bq + i]!;
    const xr = eRe * qr - eIm * qi;
    const xi = eRe * qi + eIm * qr;
    re[bp + i] = c * pr - s * xr;
    im[bp + i] = c * pi - s * xi;
    re[bq + i] = s * pr + c * xr;
    im[bq + i] = s * pi + c * xi;
  }
}

/** σ_k = ‖a_k‖, U's columns a_k/σ_k (completed to an orthonormal basis where σ_k = 0), sorted by descending σ. */
function assemble(aRe: Float64Array, aIm: Float64Array, vRe: Float64Array, vIm: Float64Array, n: number): SingularValueDecomposition {
  const norms = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += aRe[k * n + i]! ** 2 + aIm[k * n + i]! ** 2;
    norms[k] = Math.sqrt(sum);
  }
  const order = Array.from({ length: n }, (_, k) => k).sort((x, y) => norms[y]! - norms[x]! || x - y);
  const sigma = new Float64Array(n);
  const U: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  const V: ComplexMatrix = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  const missing: number[] = [];
  order.forEach((k, column) => {
    sigma[column] = norms[k]!;
    for (let i = 0; i < n; i++) {
      V.re[i * n + column] = vRe[k * n + i]!;
      V.im[i * n + column] = vIm[k * n + i]!;
    }
    if (norms[k]! === 0) {
      missing.push(column);
      return;
    }
    for (let i = 0; i < n; i++) {
      U.re[i * n + column] = aRe[k * n + i]! / norms[k]!;
      U.im[i * n + column] = aIm[k * n + i]! / norms[k]!;
    }
  });
  completeColumns(U, missing);
  return { U, sigma, V };
}

/** Fills the given (zero) columns of U with unit vectors orthogonal to all other columns (Gram–Schmidt on e_0, e_1, …). */
function completeColumns(U: ComplexMatrix, missing: readonly number[]): void {
  const n = U.n;
  const filled = new Set(Array.from({ length: n }, (_, k) => k).filter((k) => !missing.includes(k)));
  let candidate = 0;
  for (const column of missing) {
    for (; candidate < n; candidate++) {
      const re = new Float64Array(n);
      const im = new Float64Array(n);
      re[candidate] = 1;
      // Two passes of projection keep the result orthogonal to rounding level.
      for (let pass = 0; pass < 2; pass++) {
        for (const other of filled) {
          let dr = 0;
          let di = 0;
          for (let i = 0; i < n; i++) {
            dr += U.re[i * n + other]! * re[i]! + U.im[i * n + other]! * im[i]!;
            di += U.re[i * n + other]! * im[i]! - U.im[i * n + other]! * re[i]!;
          }
          for (let i = 0; i < n; i++) {
            re[i] = re[i]! - (dr * U.re[i * n + other]! - di * U.im[i * n + other]!);
            im[i] = im[i]! - (dr * U.im[i * n + other]! + di * U.re[i * n + other]!);
          }
        }
      }
      let norm = 0;
      for (let i = 0; i < n; i++) norm += re[i]! ** 2 + im[i]! ** 2;
      norm = Math.sqrt(norm);
      if (norm > 0.5) {
        for (let i = 0; i < n; i++) {
          U.re[i * n + column] = re[i]! / norm;
          U.im[i * n + column] = im[i]! / norm;
        }
        filled.add(column);
        candidate++;
        break;
      }
    }
  }
}
