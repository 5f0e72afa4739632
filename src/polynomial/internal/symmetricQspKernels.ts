/**
 * symmetricQspKernels: Re⟨0|U(x)|0⟩ of a symmetric phase list (φ_k = φ_{d−k}) and its derivatives with
 * respect to the reduced phases ψ_k (φ_k and φ_{d−k} moved together), at many points, in O(d/2) per
 * point. Because W(x) and e^{iφZ} are symmetric matrices, the second half of the product is the
 * transpose of the first: U = A W Aᵀ (d odd, A = E_0 W E_1 … W E_m, m = (d−1)/2) or U = A E_m Aᵀ
 * (d even, A = E_0 W … E_{m−1} W, m = d/2), with E_k = e^{iφ_k Z}, so ⟨0|U|0⟩ = r M rᵀ for the row
 * r = ⟨0|A| (the symmetric structure used by Dong, Lin, Ni & Wang, Quantum 8, 1558 (2024)).
 * Phases are passed as cos φ_k, sin φ_k for k = 0 … m. Values are compensated for the rounding of
 * √(1−x²) (signalNormDrift.ts); derivatives, which only steer Newton's method, are not.
 */
import { signalNormCorrection } from './signalNormDrift.js';

/** Re⟨0|U(x)|0⟩ at every point of xs into out. */
export function symmetricQspValues(degree: number, cosines: Float64Array, sines: Float64Array, xs: Float64Array, out: Float64Array): void {
  const m = degree >> 1;
  if (degree === 0) {
    out.fill(cosines[0]!);
    return;
  }
  const odd = (degree & 1) === 1;
  const steps = odd ? m + 1 : m; // number of E_k W pairs in A (for odd d the last E_m has no W after it)
  for (let p = 0; p < xs.length; p++) {
    const x = xs[p]!;
    const s = Math.sqrt((1 - x) * (1 + x));
    let aRe = 1;
    let aIm = 0;
    let bRe = 0;
    let bIm = 0;
    for (let k = 0; k < steps; k++) {
      const c = cosines[k]!;
      const sn = sines[k]!;
      const eARe = aRe * c - aIm * sn;
      const eAIm = aRe * sn + aIm * c;
      const eBRe = bRe * c + bIm * sn;
      const eBIm = bIm * c - bRe * sn;
      if (odd && k === m) {
        aRe = eARe;
        aIm = eAIm;
        bRe = eBRe;
        bIm = eBIm;
        break;
      }
      aRe = x * eARe - s * eBIm;
      aIm = x * eAIm + s * eBRe;
      bRe = x * eBRe - s * eAIm;
      bIm = x * eBIm + s * eARe;
    }
    // a², b², a·b
    const aaRe = aRe * aRe - aIm * aIm;
    const aaIm = 2 * aRe * aIm;
    const bbRe = bRe * bRe - bIm * bIm;
    const bbIm = 2 * bRe * bIm;
    if (odd) {
      // r W rᵀ = x(a² + b²) + 2i s a b
      const abIm = aRe * bIm + aIm * bRe;
      out[p] = (x * (aaRe + bbRe) - 2 * s * abIm) * signalNormCorrection(x, s, degree);
    } else {
      // r E_m rᵀ = e^{iφ_m} a² + e^{−iφ_m} b²
      const c = cosines[m]!;
      const sn = sines[m]!;
      out[p] = (c * (aaRe + bbRe) - sn * (aaIm - bbIm)) * signalNormCorrection(x, s, degree);
    }
  }
}

/**
 * The Jacobian J[p·(m+1) + k] = ∂ Re⟨0|U(x_p)|0⟩ / ∂ψ_k (row-major, one row per point), k = 0 … m.
 * With ρ_k = ⟨0|E_0 W … E_k| and v_k the column that completes the product (v_k = W E_{k+1} v_{k+1}),
 * ∂⟨0|U|0⟩/∂ψ_k = 2 ρ_k (iZ) v_k, except the unpaired middle phase of even d, which gives r (iZ E_m) rᵀ.
 */
export function symmetricQspJacobian(degree: number, cosines: Float64Array, sines: Float64Array, xs: Float64Array, jacobian: Float64Array): void {
  const m = degree >> 1;
  const width = m + 1;
  if (degree === 0) {
    for (let p = 0; p < xs.length; p++) jacobian[p] = -sines[0]!;
    return;
  }
  const odd = (degree & 1) === 1;
  const prefix = new Float64Array(4 * width); // ρ_k as (aRe, aIm, bRe, bIm)
  for (let p = 0; p < xs.length; p++) {
    const x = xs[p]!;
    const s = Math.sqrt((1 - x) * (1 + x));
    let aRe = 1;
    let aIm = 0;
    let bRe = 0;
    let bIm = 0;
    const pairs = odd ? m + 1 : m;
    for (let k = 0; k < pairs; k++) {
      const c = cosines[k]!;
      const sn = sines[k]!;
      const eARe = aRe * c - aIm * sn;
      const eAIm = aRe * sn + aIm * c;
      const eBRe = bRe * c + bIm * sn;
      const eBIm = bIm * c - bRe * sn;
      prefix[4 * k] = eARe;
      prefix[4 * k + 1] = eAIm;
      prefix[4 * k + 2] = eBRe;
      prefix[4 * k + 3] = eBIm;
      if (odd && k === m) {
        aRe = eARe;
        aIm = eAIm;
        bRe = eBRe;
        bIm = eBIm;
      } else {
        aRe = x * eARe - s * eBIm;
        aIm = x * eAIm + s * eBRe;
        bRe = x * eBRe - s * eAIm;
        bIm = x * eBIm + s * eARe;
      }
    }
    // The column v_last: W rᵀ (odd) or W E_m rᵀ (even); rᵀ = (a, b)ᵀ.
    let uRe = aRe;
    let uIm = aIm;
    let wRe = bRe;
    let wIm = bIm;
    const row = p * width;
    if (!odd) {
      const c = cosines[m]!;
      const sn = sines[m]!;
      // ∂/∂ψ_m of r E_m rᵀ: Re[i e^{iφ_m} a² − i e^{−iφ_m} b²]
      const aaRe = aRe * aRe - aIm * aIm;
      const aaIm = 2 * aRe * aIm;
      const bbRe = bRe * bRe - bIm * bIm;
      const bbIm = 2 * bRe * bIm;
      jacobian[row + m] = -(sn * aaRe + c * aaIm) + (-sn * bbRe + c * bbIm);
      const tRe = uRe * c - uIm * sn;
      const tIm = uRe * sn + uIm * c;
      const t2Re = wRe * c + wIm * sn;
      const t2Im = wIm * c - wRe * sn;
      uRe = tRe;
      uIm = tIm;
      wRe = t2Re;
      wIm = t2Im;
    }
    // v ← W v
    let vARe = x * uRe - s * wIm;
    let vAIm = x * uIm + s * wRe;
    let vBRe = x * wRe - s * uIm;
    let vBIm = x * wIm + s * uRe;
    const last = odd ? m : m - 1;
    for (let k = last; k >= 0; k--) {
      const pARe = prefix[4 * k]!;
      const pAIm = prefix[4 * k + 1]!;
      const pBRe = prefix[4 * k + 2]!;
      const pBIm = prefix[4 * k + 3]!;
      // 2 Re[i ρ_a v_a − i ρ_b v_b] = −2 Im[ρ_a v_a − ρ_b v_b]
      jacobian[row + k] = -2 * (pARe * vAIm + pAIm * vARe - (pBRe * vBIm + pBIm * vBRe));
      if (k === 0) break;
      // v ← W E_k v
      const c = cosines[k]!;
      const sn = sines[k]!;
      const eARe = vARe * c - vAIm * sn;
      const eAIm = vARe * sn + vAIm * c;
      const eBRe = vBRe * c + vBIm * sn;
      const eBIm = vBIm * c - vBRe * sn;
      vARe = x * eARe - s * eBIm;
      vAIm = x * eAIm + s * eBRe;
      vBRe = x * eBRe - s * eAIm;
      vBIm = x * eBIm + s * eARe;
    }
  }
}
