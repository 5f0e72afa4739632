/**
 * continuedFraction: ⟨φ|(z − s(H − E0))⁻¹|φ⟩ from the Lanczos coefficients of H seeded with φ
 * (Haydock, Heine & Kelly 1972; Gagliano & Balseiro 1987):
 * w / (z − s(α_0 − E0) − β_1² / (z − s(α_1 − E0) − β_2² / …)), w = ⟨φ|φ⟩.
 */

export interface ContinuedFraction {
  readonly weight: number;
  /** s(α_k − E0). */
  readonly a: Float64Array;
  /** β_{k+1}², couples levels k and k+1 (length a.length − 1 used). */
  readonly b2: Float64Array;
}

export function continuedFraction(weight: number, alpha: readonly number[], beta: readonly number[], sign: 1 | -1, e0: number): ContinuedFraction {
  const m = alpha.length;
  const a = new Float64Array(m);
  const b2 = new Float64Array(Math.max(0, m - 1));
  for (let k = 0; k < m; k++) a[k] = sign * (alpha[k]! - e0);
  for (let k = 0; k < m - 1; k++) b2[k] = beta[k]! * beta[k]!;
  return { weight, a, b2 };
}

/** Value of the fraction at z = zr + i zi as [re, im]; an empty fraction (weight 0) gives 0. */
export function evaluateFraction(cf: ContinuedFraction, zr: number, zi: number): [number, number] {
  const m = cf.a.length;
  if (m === 0 || cf.weight === 0) return [0, 0];
  let gr = 0;
  let gi = 0;
  for (let k = m - 1; k >= 0; k--) {
    // d = z − a_k − b2_k · g  (g = 1/d of the level below)
    const b2 = k < m - 1 ? cf.b2[k]! : 0;
    const dr = zr - cf.a[k]! - b2 * gr;
    const di = zi - b2 * gi;
    const den = dr * dr + di * di;
    gr = dr / den;
    gi = -di / den;
  }
  return [cf.weight * gr, cf.weight * gi];
}
