/**
 * The factor lists of the Givens decompositions: two-mode SU(2) factors g = [[α, −β̄], [β, ᾱ]] = D(ψ) R(θ) D(χ)
 * (D(x) = diag(e^{ix}, e^{−ix}), R(θ) = [[cos θ, −sin θ], [sin θ, cos θ]]) and the row update that nulls an entry.
 */

/** One factor on modes (mode, mode+1): α = cos θ e^{i(ψ+χ)}, β = sin θ e^{i(χ−ψ)}, θ ∈ [0, π/2]. */
export interface TwoModeFactor {
  readonly mode: number;
  readonly theta: number;
  readonly psi: number;
  readonly chi: number;
}

/** u = (rotations, last on the left) · diag(e^{iφ}): the phases are applied first, then the rotations in order. */
export interface TwoModeFactors {
  readonly phases: Float64Array;
  readonly rotations: readonly TwoModeFactor[];
}

/** The factor on `mode` whose first column is (α, β) = (ar + i·ai, br + i·bi), |α|² + |β|² = 1. */
export function su2Factor(mode: number, ar: number, ai: number, br: number, bi: number): TwoModeFactor {
  const argA = Math.atan2(ai, ar);
  const argB = Math.atan2(bi, br);
  return { mode, theta: Math.atan2(Math.hypot(br, bi), Math.hypot(ar, ai)), psi: (argA - argB) / 2, chi: (argA + argB) / 2 };
}

/**
 * Rows (r−1, r) of the row-major n×n (re, im) ← G · rows with G = [[ā, b̄], [−b, a]], where (a, b) is the unit
 * vector of the entries (r−1, c), (r, c): entry (r, c) becomes 0. G† has first column (a, b).
 */
export function nullByRows(re: Float64Array, im: Float64Array, n: number, r: number, ar: number, ai: number, br: number, bi: number): void {
  for (let j = 0; j < n; j++) {
    const xr = re[(r - 1) * n + j]!;
    const xi = im[(r - 1) * n + j]!;
    const yr = re[r * n + j]!;
    const yi = im[r * n + j]!;
    re[(r - 1) * n + j] = ar * xr + ai * xi + br * yr + bi * yi;
    im[(r - 1) * n + j] = ar * xi - ai * xr + br * yi - bi * yr;
    re[r * n + j] = -(br * xr - bi * xi) + ar * yr - ai * yi;
    im[r * n + j] = -(br * xi + bi * xr) + ar * yi + ai * yr;
  }
}
