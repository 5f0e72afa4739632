/**
 * continuedFraction: ⟨φ|(z − s(H − E0))⁻¹|φ⟩ from the Lanczos coefficients of H seeded with φ
 * (Haydock, Heine & Kelly 1972; Gagliano & Balseiro 1987):
 * w / (z − s(α_0 − E0) − β_1² / (z − s(α_1 − E0) − β_2² / …)), w = ⟨φ|φ⟩, and a bound on the
 * error of cutting it after m levels (truncationBound).
 */

export interface ContinuedFraction {
  readonly weight: number;
  /** s(α_k − E0). */
  readonly a: Float64Array;
  /** β_{k+1}², couples levels k and k+1 (length a.length − 1 used). */
  readonly b2: Float64Array;
  /** β_m², the coupling of the last level to the rest of the Krylov space (0 when it closed). */
  readonly tail: number;
}

export function continuedFraction(weight: number, alpha: readonly number[], beta: readonly number[], sign: 1 | -1, e0: number): ContinuedFraction {
  const m = alpha.length;
  const a = new Float64Array(m);
  const b2 = new Float64Array(Math.max(0, m - 1));
  for (let k = 0; k < m; k++) a[k] = sign * (alpha[k]! - e0);
  for (let k = 0; k < m - 1; k++) b2[k] = beta[k]! * beta[k]!;
  const last = m === 0 ? 0 : (beta[m - 1] ?? 0);
  return { weight, a, b2, tail: last * last };
}

/**
 * A rigorous bound on |exact − evaluateFraction(cf, z)| at z = zr + i zi, zi ≠ 0, for the Lanczos
 * coefficients as computed. The exact value has the last level's denominator shifted by −u, u = β_m² t,
 * with t the resolvent entry of the remaining (Hermitian) part: t lies in the disk |t + i/(2η)| ≤ 1/(2η)
 * (η = zi > 0; mirrored for zi < 0). With the determinant ratios r_1 = c_0, r_k = c_{k−1} − β_{k−1}²/r_{k−1}
 * (c_k = z − a_k, Im r_k ≥ η) and the convergent identity A_m B_{m−1} − A_{m−1} B_m = Π_{k<m} β_k²
 * (Wall 1948, Analytic Theory of Continued Fractions, ch. 1; the same disks as Weyl's nested circles),
 *   exact − value = w · Π_{k=1}^{m−1} (β_k²/r_k²) / r_m · u/(r_m − u),
 * and the largest |u/(r_m − u)| over u's disk (centre −iρ, radius ρ = β_m²/(2η)) is that of the image
 * disk of the Möbius map: with D = |r_m|² + 2ρ Im r_m, it is |r_m (r̄_m − iρ)/D − 1| + |r_m| ρ / D.
 * Infinity on the real axis. Rounding in the Lanczos recurrence itself is not included.
 */
export function truncationBound(cf: ContinuedFraction, zr: number, zi: number): number {
  const m = cf.a.length;
  if (m === 0 || cf.weight === 0 || cf.tail === 0) return 0;
  const eta = Math.abs(zi);
  if (!(eta > 0)) return Number.POSITIVE_INFINITY;
  // The coefficients are real, so the bound at z̄ equals the bound at z: work with Im z = η > 0.
  let log = Math.log(cf.weight);
  let rr = 0;
  let ri = 0;
  for (let k = 1; k <= m; k++) {
    const cr = zr - cf.a[k - 1]!;
    if (k === 1) {
      rr = cr;
      ri = eta;
    } else {
      const b2 = cf.b2[k - 2]!;
      const den = rr * rr + ri * ri;
      [rr, ri] = [cr - (b2 * rr) / den, eta + (b2 * ri) / den];
      log += Math.log(b2);
    }
    const size = Math.hypot(rr, ri);
    log -= k < m ? 2 * Math.log(size) : Math.log(size);
  }
  const rho = cf.tail / (2 * eta);
  const d = rr * rr + ri * ri + 2 * rho * ri;
  // r (r̄ − iρ) = |r|² + ρ Im r − iρ Re r … written out: (rr + i ri)(rr − i(ri + ρ))
  const cRe = (rr * rr + ri * (ri + rho)) / d - 1;
  const cIm = (ri * rr - rr * (ri + rho)) / d;
  const worst = Math.hypot(cRe, cIm) + (Math.hypot(rr, ri) * rho) / d;
  return Math.exp(log) * worst;
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
