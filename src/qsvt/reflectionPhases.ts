/**
 * reflectionPhases: converts QSP phases from the Wx convention to the reflection convention the QSVT circuit uses, so
 * that the circuit's ⟨0|·|0⟩ element equals the Wx one exactly (no leftover global phase).
 *
 * Wx: U_W(x) = e^{iφ_0 Z} Π_{k=1..d} [W(x) e^{iφ_k Z}], W(x) = [[x, i√(1−x²)], [i√(1−x²), x]].
 * Reflection: U_R(x) = e^{iψ_0 Z} Π_{k=1..d} [R(x) e^{iψ_k Z}], R(x) = [[x, √(1−x²)], [√(1−x²), −x]] — the action of a
 * block-encoding (and of its adjoint) on each two-dimensional invariant subspace of Jordan's lemma.
 * Since R(x) = −i e^{iπZ/4} W(x) e^{iπZ/4} (Martyn, Rossi, Tan & Chuang, PRX Quantum 2, 040203, 2021, Sec. II; the same
 * offsets π/4, π/2, …, π/2, π/4 as the open-source conversion of their companion code, up to signs that only change the
 * global phase), ψ_k = φ_k − π/2 inside, ψ_d = φ_d − π/4 and ψ_0 = φ_0 − π/4 + dπ/2: the last term absorbs the factor i^d
 * left over by the d substitutions, because e^{iπZ/2} = iZ and Z|0> = |0>. Flipping the sign of every ψ conjugates
 * ⟨0|U_R|0⟩ (R is real), which the real-part combination relies on.
 */
export function reflectionPhases(wxPhases: Float64Array): Float64Array {
  const d = wxPhases.length - 1;
  if (d < 1) throw new RangeError(`reflectionPhases: need at least two phases (degree ≥ 1), got ${wxPhases.length}`);
  const psi = new Float64Array(d + 1);
  for (let k = 1; k < d; k++) psi[k] = wxPhases[k]! - Math.PI / 2;
  psi[d] = wxPhases[d]! - Math.PI / 4;
  psi[0] = wxPhases[0]! - Math.PI / 4 + ((d % 4) * Math.PI) / 2;
  return psi;
}
