/**
 * lanczos: the three-term Lanczos recurrence for a Hermitian operator (Lanczos 1950), optionally
 * keeping the basis with full reorthogonalisation (twice, "twice is enough") or a single-precision
 * copy of it, and keeping every vector orthogonal to already-found eigenvectors (deflation).
 * Vectors are normalised lazily (v_k = u_k / n_k): the factor rides along in the next product, which
 * saves a pass over memory per step.
 */
import { serialSteps } from './serialSteps.js';
import { axpy, scale, sharedFloat32, zeroVec, type CVec } from './vec.js';

/** One term c·v of a linear combination (c complex; real kernels need im = 0). */
export interface LinearTerm {
  readonly re: number;
  readonly im: number;
  readonly v: CVec;
}

/** ‖w‖² and ⟨q|w⟩ for each requested q, from one pass. */
export interface Projection {
  readonly normSquared: number;
  readonly overlaps: readonly (readonly [number, number])[];
}

/**
 * The vector work of a Lanczos step. Sums run row by row in a fixed order, so a threaded
 * implementation gives the same bytes whatever the number of threads.
 */
export interface LanczosSteps {
  /** y = c·H x − s·z (y overwritten), returning Re⟨x|y⟩. */
  step(x: CVec, c: number, y: CVec, s: number, z: CVec): number;
  /**
   * w −= Σ c_k v_k, then ‖w‖² and ⟨q|w⟩ for every q of `against`; with `copy`, w is also written
   * there rounded to single precision.
   */
  update(terms: readonly LinearTerm[], w: CVec, against: readonly CVec[], copy: CompactVec | null): Projection;
}

export interface LanczosSpec {
  apply(x: CVec, y: CVec): void;
  /** Fused (and possibly multi-threaded) step operations for real vectors, used when given. */
  readonly steps?: LanczosSteps | null;
  /** Normalised start vector (not modified). */
  readonly start: CVec;
  readonly maxSteps: number;
  readonly deflate: readonly CVec[];
  /** Store the basis and reorthogonalise against all of it (small sectors). */
  readonly keepBasis: boolean;
  /** Without keepBasis: store v_1, v_2, … in single precision (no reorthogonalisation) for combineCompact. */
  readonly compactBasis?: boolean;
  /** Complex vectors are needed (complex H or complex start). */
  readonly complex: boolean;
  /** Called after each step with α_0…α_m and β_1…β_{m+1}; return true to stop. */
  stop?(alpha: readonly number[], beta: readonly number[]): boolean;
  /** Called with each Lanczos vector v_k = scale·u as it is formed (before step k). */
  visit?(k: number, u: CVec, scale: number): void;
  /** Return right after visiting v_{maxSteps−1}, skipping its product with H. */
  readonly visitOnlyLast?: boolean;
}

export interface LanczosRun {
  readonly alpha: number[];
  /** beta[k] couples v_k and v_{k+1}; the last one is the norm of the final residual. */
  readonly beta: number[];
  /** The Krylov space closed (β ≈ 0): the recurrence is exact. */
  readonly exhausted: boolean;
  /** Orthonormal v_0, v_1, … when keepBasis was asked for. */
  readonly basis: CVec[] | null;
  /** v_1, v_2, … in single precision when compactBasis was asked for. */
  readonly compact: CompactVec[] | null;
}

/** A vector rounded to single precision (half the memory of a CVec); it stands for scale·(re + i im). */
export interface CompactVec {
  readonly re: Float32Array;
  readonly im: Float32Array | null;
  readonly scale: number;
}

/** Relative size of β below which the Krylov space counts as exhausted. */
export const EXHAUSTED = 1e-12;

export function lanczos(spec: LanczosSpec): LanczosRun {
  const dim = spec.start.re.length;
  const ops = (spec.complex ? null : (spec.steps ?? null)) ?? serialSteps(spec.apply);
  const alpha: number[] = [];
  const beta: number[] = [];
  const basis: CVec[] | null = spec.keepBasis ? [spec.start] : null;
  const compact: CompactVec[] | null = !spec.keepBasis && spec.compactBasis === true ? [] : null;
  // v_k = u / size; the previous vector is uPrev / sizePrev.
  let u: CVec = spec.start;
  let size = 1;
  let uPrev: CVec | null = null;
  let sizePrev = 1;
  let spare: CVec | null = null;
  let scaleSeen = 0;
  let exhausted = false;
  for (let m = 0; m < spec.maxSteps; m++) {
    spec.visit?.(m, u, 1 / size);
    if (spec.visitOnlyLast === true && m === spec.maxSteps - 1) break;
    const w: CVec = spare ?? zeroVec(dim, spec.complex);
    // w = H v_k − β_k v_{k−1}, with β_k = size (the norm u_k had when it was formed).
    const a = ops.step(u, 1 / size, w, uPrev === null ? 0 : size / sizePrev, uPrev ?? u) / size;
    const against = basis === null ? spec.deflate : [...spec.deflate, ...basis];
    const rounds = against.length === 0 ? 0 : basis !== null ? 2 : 1;
    const copy = compact === null ? null : compactVec(dim, spec.complex);
    let projection = ops.update([{ re: a / size, im: 0, v: u }], w, rounds > 0 ? against : [], rounds > 0 ? null : copy);
    for (let round = 1; round <= rounds; round++) {
      const terms = projection.overlaps.map(([re, im], j) => ({ re, im, v: against[j]! }));
      projection = ops.update(terms, w, round < rounds ? against : [], round < rounds ? null : copy);
    }
    const b = Math.sqrt(projection.normSquared);
    alpha.push(a);
    beta.push(b);
    scaleSeen = Math.max(scaleSeen, Math.abs(a), b);
    if (b <= EXHAUSTED * Math.max(scaleSeen, 1e-300) || b === 0) {
      exhausted = true;
      break;
    }
    if (spec.stop?.(alpha, beta) === true) break;
    let wSize = b;
    if (basis !== null) {
      scale(1 / b, w);
      wSize = 1;
      basis.push(w);
      spare = null;
    } else {
      spare = uPrev === null || uPrev === spec.start ? null : uPrev;
      if (copy !== null) compact!.push({ ...copy, scale: 1 / b });
    }
    uPrev = u;
    sizePrev = size;
    u = w;
    size = wSize;
  }
  return { alpha, beta, exhausted, basis, compact };
}

function compactVec(dim: number, complex: boolean): CompactVec {
  return { re: sharedFloat32(dim), im: complex ? sharedFloat32(dim) : null, scale: 1 };
}

/** Σ_k y_k v_k from a stored basis. */
export function combine(basis: readonly CVec[], y: ArrayLike<number>, complex: boolean): CVec {
  const out = zeroVec(basis[0]!.re.length, complex);
  for (let k = 0; k < y.length; k++) axpy(y[k]!, 0, basis[k]!, out);
  return out;
}

/**
 * y_0 v_0 + Σ_{k≥1} y_k ṽ_k with v_0 the (double-precision) start and ṽ_k the single-precision basis:
 * the rounding error is ~6e-8·‖Σ_{k≥1} y_k v_k‖, negligible once the start is nearly an eigenvector.
 */
export function combineCompact(start: CVec, compact: readonly CompactVec[], y: ArrayLike<number>, complex: boolean): CVec {
  const out = zeroVec(start.re.length, complex);
  axpy(y[0]!, 0, start, out);
  for (let k = 1; k < y.length; k++) {
    const v = compact[k - 1]!;
    const c = y[k]! * v.scale;
    const vr = v.re;
    const or = out.re;
    for (let t = 0; t < vr.length; t++) or[t]! += c * vr[t]!;
    if (v.im !== null) {
      const vi = v.im;
      const oi = out.im!;
      for (let t = 0; t < vi.length; t++) oi[t]! += c * vi[t]!;
    }
  }
  return out;
}

/** Σ_k y_k v_k by running the same recurrence again (bit-identical vectors), storing nothing. */
export function combineByRerun(spec: LanczosSpec, steps: number, y: ArrayLike<number>): CVec {
  const out = zeroVec(spec.start.re.length, spec.complex);
  lanczos({
    ...spec,
    keepBasis: false,
    compactBasis: false,
    maxSteps: steps,
    stop: undefined,
    visitOnlyLast: true,
    visit: (k, u, scale) => {
      if (k < y.length) axpy(y[k]! * scale, 0, u, out);
    },
  });
  return out;
}
