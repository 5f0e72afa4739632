// flagAmplitude: the energies the register can hold, E(v) = E_min + v·Δ for v = 0 … R, the normaliser c = min_v |w − E(v)|,
// and the ry/rz angles that put f(v) = c/(w − E(v)) (|f| ≤ 1) on the flag's |0>.
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';

export interface RegisterEnergies {
  /** E(0). */
  readonly minEnergy: number;
  readonly step: number;
  /** Largest register value that occurs, R = sumMax − sumMin. */
  readonly top: number;
  readonly w: ComplexScalar;
  /** c = min over v = 0 … R of |w − E(v)|. */
  readonly c: number;
}

export function registerEnergies(minEnergy: number, step: number, top: number, w: ComplexScalar): RegisterEnergies {
  const nearest = Math.min(top, Math.max(0, Math.round((w.re - minEnergy) / step)));
  const c = Math.hypot(w.re - (minEnergy + nearest * step), w.im);
  return { minEnergy, step, top, w, c };
}

export function energyAt(r: RegisterEnergies, v: number): number {
  return r.minEnergy + v * r.step;
}

/** ry angle θ = 2 acos|f| and rz angle λ = −2 arg f, so rz(λ) ry(θ)|0> has f on |0>. */
export function flagAngles(r: RegisterEnergies, v: number): { theta: number; lambda: number } {
  const a = r.w.re - energyAt(r, v);
  const magnitude = Math.min(1, r.c / Math.hypot(a, r.w.im));
  return { theta: 2 * Math.acos(magnitude), lambda: -2 * Math.atan2(-r.w.im, a) };
}
