/**
 * reflectionSequenceValue: what a real-part QSVT sequence does to one singular value σ. On each two-dimensional invariant
 * subspace of Jordan's lemma the block acts as R(σ) = [[σ, √(1−σ²)], [√(1−σ²), −σ]] and each projector-controlled phase as
 * e^{iψZ} (Gilyén, Su, Low & Wiebe, STOC 2019, Sec. 3; reflectionPhases), so the sequence's element is
 * ⟨0|e^{iψ_0 Z} R e^{iψ_1 Z} R ⋯ R e^{iψ_d Z}|0⟩, and averaging the sequences ψ and −ψ (qsvtCircuit) keeps its real part.
 * Evaluated from the phases the circuit itself uses, not from the target polynomial.
 */

/** Re ⟨0|U_R(σ)|0⟩ for reflection-convention phases ψ_0 … ψ_d (the circuit applies ψ_d first) and σ in [0, 1]. */
export function reflectionSequenceValue(psi: Float64Array, sigma: number): number {
  const d = psi.length - 1;
  if (d < 1) throw new RangeError(`reflectionSequenceValue: need at least two phases, got ${psi.length}`);
  if (!(sigma >= 0 && sigma <= 1 + 1e-12)) throw new RangeError(`reflectionSequenceValue: σ = ${sigma} is not in [0, 1]`);
  const x = Math.min(1, sigma);
  const s = Math.sqrt(Math.max(0, 1 - x * x));
  // v = e^{iψ_d Z}|0> = (e^{iψ_d}, 0); then, for k = d−1 … 0, v ← e^{iψ_k Z} R v.
  let ar = Math.cos(psi[d]!);
  let ai = Math.sin(psi[d]!);
  let br = 0;
  let bi = 0;
  for (let k = d - 1; k >= 0; k--) {
    const nr = x * ar + s * br;
    const ni = x * ai + s * bi;
    const mr = s * ar - x * br;
    const mi = s * ai - x * bi;
    const c = Math.cos(psi[k]!);
    const t = Math.sin(psi[k]!);
    ar = nr * c - ni * t;
    ai = nr * t + ni * c;
    br = mr * c + mi * t;
    bi = mi * c - mr * t;
  }
  return ar;
}
