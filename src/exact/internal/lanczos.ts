/**
 * lanczos: the three-term Lanczos recurrence for a Hermitian operator (Lanczos 1950), optionally
 * keeping the basis with full reorthogonalisation (twice, "twice is enough") or a single-precision
 * copy of it, and keeping every vector orthogonal to already-found eigenvectors (deflation).
 */
import { axpy, dot, norm, orthogonalize, scale, subtractAndDot, subtractAndNorm, zeroVec, type CVec } from './vec.js';

/**
 * The vector work of a Lanczos step on real vectors, as SectorHamiltonian.steps provides it: sums run
 * row by row, so they give the same bytes whatever the threads.
 */
export interface LanczosSteps {
  /** y = H x − s z, returning ⟨x|y⟩. */
  step(x: CVec, y: CVec, s: number, z: CVec): number;
  /** w −= a v, returning ‖w‖. */
  subtractNorm(a: number, v: CVec, w: CVec): number;
  /** w *= c. */
  scale(c: number, w: CVec): void;
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
  /** Called with each Lanczos vector v_k as it is formed (before step k). */
  visit?(k: number, v: CVec): void;
  /** Return right after visiting v_{maxSteps−1}, skipping its product with H. */
  readonly visitOnlyLast?: boolean;
}

export interface LanczosRun {
  readonly alpha: number[];
  /** beta[k] couples v_k and v_{k+1}; the last one is the norm of the final residual. */
  readonly beta: number[];
  /** The Krylov space closed (β ≈ 0): the recurrence is exact. */
  readonly exhausted: boolean;
  readonly basis: CVec[] | null;
  /** v_1, v_2, … rounded to single precision when compactBasis was asked for. */
  readonly compact: CompactVec[] | null;
}

/** A vector rounded to single precision (half the memory of a CVec). */
export interface CompactVec {
  readonly re: Float32Array;
  readonly im: Float32Array | null;
}

/** Relative size of β below which the Krylov space counts as exhausted. */
export const EXHAUSTED = 1e-12;

export function lanczos(spec: LanczosSpec): LanczosRun {
  const dim = spec.start.re.length;
  const alpha: number[] = [];
  const beta: number[] = [];
  const basis: CVec[] | null = spec.keepBasis ? [spec.start] : null;
  const compact: CompactVec[] | null = !spec.keepBasis && spec.compactBasis === true ? [] : null;
  let v: CVec = spec.start;
  let vPrev: CVec | null = null;
  let spare: CVec | null = null;
  let betaPrev = 0;
  let scaleSeen = 0;
  let exhausted = false;
  const fused = spec.complex ? null : (spec.steps ?? null);
  for (let m = 0; m < spec.maxSteps; m++) {
    spec.visit?.(m, v);
    if (spec.visitOnlyLast === true && m === spec.maxSteps - 1) break;
    const w: CVec = spare ?? zeroVec(dim, spec.complex);
    let a: number;
    if (fused !== null) a = fused.step(v, w, betaPrev, vPrev ?? v);
    else {
      spec.apply(v, w);
      a = vPrev !== null ? subtractAndDot(betaPrev, vPrev, w, v) : dot(v, w)[0];
    }
    let b: number;
    if (spec.deflate.length === 0 && basis === null) b = fused !== null ? fused.subtractNorm(a, v, w) : subtractAndNorm(a, v, w);
    else {
      axpy(-a, 0, v, w);
      orthogonalize(w, spec.deflate);
      if (basis !== null) {
        orthogonalize(w, basis);
        orthogonalize(w, basis);
      }
      b = norm(w);
    }
    alpha.push(a);
    beta.push(b);
    scaleSeen = Math.max(scaleSeen, Math.abs(a), b, betaPrev);
    if (b <= EXHAUSTED * Math.max(scaleSeen, 1e-300) || b === 0) {
      exhausted = true;
      break;
    }
    if (spec.stop?.(alpha, beta) === true) break;
    if (fused !== null) fused.scale(1 / b, w);
    else scale(1 / b, w);
    if (basis !== null) {
      basis.push(w);
      spare = null;
    } else {
      spare = vPrev === null || vPrev === spec.start ? null : vPrev;
      compact?.push({ re: new Float32Array(w.re), im: w.im === null ? null : new Float32Array(w.im) });
    }
    vPrev = v;
    v = w;
    betaPrev = b;
  }
  return { alpha, beta, exhausted, basis, compact };
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
    const c = y[k]!;
    const v = compact[k - 1]!;
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
    maxSteps: steps,
    stop: undefined,
    visitOnlyLast: true,
    visit: (k, v) => {
      if (k < y.length) axpy(y[k]!, 0, v, out);
    },
  });
  return out;
}
