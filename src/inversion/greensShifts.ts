// greensShifts: the two spectral shifts w of the zero-temperature Green's function, particle w = z + E0 and hole w = E0 − z.
import type { ComplexScalar } from '../linalg/ComplexScalar.js';

export interface GreensShifts {
  /** w⁺ = z + E0: G⁺_ij(z) = <ψ0| a_i (w⁺ − H)⁻¹ a_j† |ψ0>. */
  readonly particle: ComplexScalar;
  /** w⁻ = E0 − z: G⁻_ij(z) = −<ψ0| a_j† (w⁻ − H)⁻¹ a_i |ψ0>, since (z + H − E0)⁻¹ = −(E0 − z − H)⁻¹. */
  readonly hole: ComplexScalar;
}

/**
 * With the conventions of CONVENTIONS.md (G⁺ = <a_i (z − (H − E0))⁻¹ a_j†>, G⁻ = <a_j† (z + (H − E0))⁻¹ a_i>), both parts
 * are resolvents (w − H)⁻¹: the particle part at w⁺ = z + E0 (Im w⁺ = η > 0) with sign +1, the hole part at w⁻ = E0 − z
 * (Im w⁻ = −η < 0) with sign −1 — the sign is not part of w and must be applied by the caller.
 */
export function greensShifts(E0: number, z: ComplexScalar): GreensShifts {
  return { particle: { re: z.re + E0, im: z.im }, hole: { re: E0 - z.re, im: -z.im } };
}
