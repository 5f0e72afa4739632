/**
 * clementsDecomposition: factors a unitary u into n(n−1)/2 adjacent SU(2) rotations in the rectangular arrangement
 * (depth n) and a diagonal, nulling the lower triangle by alternating column and row rotations
 * (Clements et al., Optica 3, 1460, 2016), then moving the diagonal to the first-applied end.
 */
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import { nullByRows, su2Factor, type TwoModeFactor, type TwoModeFactors } from './twoModeFactors.js';

/** H† = [[ȳ, −x̄], [x, y]] of a column rotation on (mode, mode+1), stored by its first row and column. */
interface ColumnRotation {
  readonly mode: number;
  readonly xr: number;
  readonly xi: number;
  readonly yr: number;
  readonly yi: number;
}

/**
 * (G_A ⋯ G_1) u (H_1 ⋯ H_B) = D gives u = G_1† ⋯ G_A† D H_B† ⋯ H_1†; D H_b† = g_b D' (D' equal on the pair) moves D
 * right, so u = G_1† ⋯ G_A† g_B ⋯ g_1 D_final: the circuit applies D_final, g_1 … g_B, then G_A† … G_1†.
 */
export function clementsDecomposition(u: ComplexMatrix): TwoModeFactors {
  const n = u.n;
  const re = Float64Array.from(u.re);
  const im = Float64Array.from(u.im);
  const rows: TwoModeFactor[] = [];
  const columns: ColumnRotation[] = [];
  for (let i = 1; i < n; i++) {
    if (i % 2 === 1) {
      for (let j = 0; j < i; j++) columns.push(nullByColumns(re, im, n, n - 1 - j, i - j - 1));
    } else {
      for (let j = 1; j <= i; j++) rows.push(nullRow(re, im, n, n + j - i - 1, j - 1));
    }
  }
  const phases = Float64Array.from({ length: n }, (_, k) => Math.atan2(im[k * n + k]!, re[k * n + k]!));
  const moved: TwoModeFactor[] = [];
  for (let b = columns.length - 1; b >= 0; b--) moved.push(throughDiagonal(columns[b]!, phases));
  return { phases, rotations: [...moved.reverse(), ...rows.reverse()] };
}

/** Left rotation on rows (r−1, r) nulling (r, c); returns G† (identity when both entries vanish). */
function nullRow(re: Float64Array, im: Float64Array, n: number, r: number, c: number): TwoModeFactor {
  const ar = re[(r - 1) * n + c]!;
  const ai = im[(r - 1) * n + c]!;
  const br = re[r * n + c]!;
  const bi = im[r * n + c]!;
  const rho = Math.hypot(ar, ai, br, bi);
  if (rho === 0) return { mode: r - 1, theta: 0, psi: 0, chi: 0 };
  nullByRows(re, im, n, r, ar / rho, ai / rho, br / rho, bi / rho);
  return su2Factor(r - 1, ar / rho, ai / rho, br / rho, bi / rho);
}

/** Right rotation H = [[y, x̄], [−x, ȳ]] on columns (c, c+1), (x, y) the unit vector of entries (r, c), (r, c+1): nulls (r, c). */
function nullByColumns(re: Float64Array, im: Float64Array, n: number, r: number, c: number): ColumnRotation {
  let xr = re[r * n + c]!;
  let xi = im[r * n + c]!;
  let yr = re[r * n + c + 1]!;
  let yi = im[r * n + c + 1]!;
  const rho = Math.hypot(xr, xi, yr, yi);
  if (rho === 0) return { mode: c, xr: 0, xi: 0, yr: 1, yi: 0 };
  [xr, xi, yr, yi] = [xr / rho, xi / rho, yr / rho, yi / rho];
  for (let k = 0; k < n; k++) {
    const pr = re[k * n + c]!;
    const pi = im[k * n + c]!;
    const qr = re[k * n + c + 1]!;
    const qi = im[k * n + c + 1]!;
    // new col c = p·y − q·x; new col c+1 = p·x̄ + q·ȳ.
    re[k * n + c] = pr * yr - pi * yi - (qr * xr - qi * xi);
    im[k * n + c] = pr * yi + pi * yr - (qr * xi + qi * xr);
    re[k * n + c + 1] = pr * xr + pi * xi + qr * yr + qi * yi;
    im[k * n + c + 1] = pi * xr - pr * xi + qi * yr - qr * yi;
  }
  return { mode: c, xr, xi, yr, yi };
}

/** D H† = g D' with g ∈ SU(2) and D' = e^{i(φ_c + φ_{c+1})/2} on both modes of the pair; updates `phases` to D'. */
function throughDiagonal(h: ColumnRotation, phases: Float64Array): TwoModeFactor {
  const c = h.mode;
  const p1 = phases[c]!;
  const p2 = phases[c + 1]!;
  const half = (p1 + p2) / 2;
  phases[c] = phases[c + 1] = half;
  // First column of H† is (ȳ, x); g's first column is (e^{i(φ1−δ/2)} ȳ, e^{i(φ2−δ/2)} x).
  const [c1, s1] = [Math.cos(p1 - half), Math.sin(p1 - half)];
  const [c2, s2] = [Math.cos(p2 - half), Math.sin(p2 - half)];
  return su2Factor(c, c1 * h.yr + s1 * h.yi, s1 * h.yr - c1 * h.yi, c2 * h.xr - s2 * h.xi, c2 * h.xi + s2 * h.xr);
}
