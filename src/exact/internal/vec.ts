/**
 * Complex vectors as separate real and imaginary Float64Arrays (im = null for a real vector; large
 * ones shared with worker threads) and the few BLAS-1 operations the Lanczos codes need.
 */

/** A vector in a Fock sector; `im` is null when every entry is real. */
export interface CVec {
  readonly re: Float64Array;
  readonly im: Float64Array | null;
}

/** Vectors from this length on live in SharedArrayBuffers, so worker threads can share them. */
export const SHARED_LENGTH = 4096;

/** A zero Float64Array, SharedArrayBuffer-backed from SHARED_LENGTH on. */
export function sharedFloat64(length: number): Float64Array {
  return length >= SHARED_LENGTH ? new Float64Array(new SharedArrayBuffer(8 * length)) : new Float64Array(length);
}

/** A zero Float32Array, SharedArrayBuffer-backed from SHARED_LENGTH on. */
export function sharedFloat32(length: number): Float32Array {
  return length >= SHARED_LENGTH ? new Float32Array(new SharedArrayBuffer(4 * length)) : new Float32Array(length);
}

export function zeroVec(dim: number, complex: boolean): CVec {
  return { re: sharedFloat64(dim), im: complex ? sharedFloat64(dim) : null };
}

export function copyVec(x: CVec): CVec {
  return { re: x.re.slice(), im: x.im === null ? null : x.im.slice() };
}

/** ⟨x|y⟩ = Σ conj(x_k) y_k as [re, im]. */
export function dot(x: CVec, y: CVec): [number, number] {
  const xr = x.re;
  const yr = y.re;
  const n = xr.length;
  let sr = 0;
  let si = 0;
  if (x.im === null && y.im === null) {
    for (let k = 0; k < n; k++) sr += xr[k]! * yr[k]!;
    return [sr, 0];
  }
  const xi = x.im;
  const yi = y.im;
  for (let k = 0; k < n; k++) {
    const a = xr[k]!;
    const b = xi === null ? 0 : xi[k]!;
    const c = yr[k]!;
    const d = yi === null ? 0 : yi[k]!;
    sr += a * c + b * d;
    si += a * d - b * c;
  }
  return [sr, si];
}

export function norm(x: CVec): number {
  let s = 0;
  const xr = x.re;
  for (let k = 0; k < xr.length; k++) s += xr[k]! * xr[k]!;
  if (x.im !== null) {
    const xi = x.im;
    for (let k = 0; k < xi.length; k++) s += xi[k]! * xi[k]!;
  }
  return Math.sqrt(s);
}

/** y += (ar + i ai) x; y must be complex when ai ≠ 0 or x is complex. */
export function axpy(ar: number, ai: number, x: CVec, y: CVec): void {
  const n = y.re.length;
  const xr = x.re;
  const yr = y.re;
  const xi = x.im;
  const yi = y.im;
  if (yi === null) {
    for (let k = 0; k < n; k++) yr[k]! += ar * xr[k]!;
    return;
  }
  if (xi === null) {
    for (let k = 0; k < n; k++) {
      yr[k]! += ar * xr[k]!;
      yi[k]! += ai * xr[k]!;
    }
    return;
  }
  for (let k = 0; k < n; k++) {
    const a = xr[k]!;
    const b = xi[k]!;
    yr[k]! += ar * a - ai * b;
    yi[k]! += ar * b + ai * a;
  }
}

export function scale(s: number, x: CVec): void {
  const xr = x.re;
  for (let k = 0; k < xr.length; k++) xr[k]! *= s;
  if (x.im !== null) {
    const xi = x.im;
    for (let k = 0; k < xi.length; k++) xi[k]! *= s;
  }
}

/** Removes from x its components along the orthonormal vectors `basis` (classical Gram–Schmidt). */
export function orthogonalize(x: CVec, basis: readonly CVec[]): void {
  for (const b of basis) {
    const [cr, ci] = dot(b, x);
    axpy(-cr, -ci, b, x);
  }
}
