/**
 * givensDecomposition: factors a unitary u as G_1† ⋯ G_L† D (L = n(n−1)/2 adjacent-row SU(2) rotations, D diagonal)
 * by nulling the below-diagonal entries column by column from the bottom (Reck et al., Phys. Rev. Lett. 73, 58, 1994).
 */
import type { ComplexMatrix } from '../../model/FermionModel.js';

/** One factor g = G† = [[α, −β̄], [β, ᾱ]] on modes (mode, mode+1), with α = cos θ e^{i(ψ+χ)}, β = sin θ e^{i(χ−ψ)}. */
export interface TwoModeFactor {
  readonly mode: number;
  readonly theta: number;
  readonly psi: number;
  readonly chi: number;
}

export interface GivensFactors {
  /** φ_k with D_kk = e^{iφ_k}: applied first. */
  readonly phases: Float64Array;
  /** The factors in application order (G_L† first, G_1† last), so u = (product, last on the left) · D. */
  readonly rotations: readonly TwoModeFactor[];
}

/** The Reck-triangle factors of a unitary u (not checked here). */
export function givensDecomposition(u: ComplexMatrix): GivensFactors {
  const n = u.n;
  const re = Float64Array.from(u.re);
  const im = Float64Array.from(u.im);
  const nulling: TwoModeFactor[] = [];
  for (let c = 0; c < n - 1; c++) {
    for (let r = n - 1; r > c; r--) {
      const ar = re[(r - 1) * n + c]!;
      const ai = im[(r - 1) * n + c]!;
      const br = re[r * n + c]!;
      const bi = im[r * n + c]!;
      const rho = Math.hypot(ar, ai, br, bi);
      if (rho === 0) {
        nulling.push({ mode: r - 1, theta: 0, psi: 0, chi: 0 });
        continue;
      }
      applyRows(re, im, n, r, ar / rho, ai / rho, br / rho, bi / rho);
      // g = G† has α = a/ρ and β = b/ρ.
      const argA = Math.atan2(ai, ar);
      const argB = Math.atan2(bi, br);
      nulling.push({ mode: r - 1, theta: Math.atan2(Math.hypot(br, bi), Math.hypot(ar, ai)), psi: (argA - argB) / 2, chi: (argA + argB) / 2 });
    }
  }
  const phases = Float64Array.from({ length: n }, (_, k) => Math.atan2(im[k * n + k]!, re[k * n + k]!));
  return { phases, rotations: nulling.reverse() };
}

/** Rows (r−1, r) ← G · rows with G = [[ā, b̄], [−b, a]] (a, b already divided by ρ). */
function applyRows(re: Float64Array, im: Float64Array, n: number, r: number, ar: number, ai: number, br: number, bi: number): void {
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
