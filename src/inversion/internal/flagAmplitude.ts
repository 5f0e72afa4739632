// flagAmplitude: what the flag rotation puts on |0> for every energy-register value v — f(v) = c/(w − E*(v)) with E*(v) the
// midpoint of the true energies mapped to v — the normaliser c (valid for the true operator, not only for the register),
// and the rigorous bounds on what the register's rounding and an inexact diagonalisation cost.
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import type { RegisterHull } from './registerHull.js';

export interface RegisterEnergies {
  /** Largest register value, R = sumMax − sumMin. */
  readonly top: number;
  readonly w: ComplexScalar;
  /** E*(v) = (low_v + high_v)/2; NaN for a value no occupation takes. */
  readonly centre: Float64Array;
  readonly hull: RegisterHull;
  /** g = min over occupied values of dist(w, [low_v, high_v]) ≤ the distance from w to the diagonalised operator's spectrum. */
  readonly gap: number;
  /** c = max(|Im w|, g − ρ) ≤ dist(w, spectrum of A) and ≤ |w − E*(v)| for every occupied v, so |f| ≤ 1 and ‖c(w − A)⁻¹‖ ≤ 1. */
  readonly c: number;
  /** max_v c·(high_v − low_v)/2 / (dist(w, [low_v, high_v])·|w − E*(v)|): the register's rounding, in operator norm. */
  readonly rounding: number;
  /** ρ / max(|Im w|, g): the cost of diagonalising A only up to ‖A − A'‖ ≤ ρ on the window. */
  readonly decomposition: number;
  /** True when every occupied value stands for one energy (all hull widths ≤ 1e-12·max(1, |E|)). */
  readonly exact: boolean;
}

function distance(w: ComplexScalar, low: number, high: number): number {
  const gap = w.re < low ? low - w.re : w.re > high ? w.re - high : 0;
  return Math.hypot(gap, w.im);
}

/**
 * For an occupation S with value v and energy E_S ∈ [low_v, high_v], |c/(w − E_S) − c/(w − E*)| = c|E_S − E*| /
 * (|w − E_S||w − E*|) ≤ c·(high_v − low_v)/2 / (dist(w, [low_v, high_v])·|w − E*|). With ρ ≥ ‖A − A'‖ (A' the operator the
 * circuit diagonalises exactly), ‖c(w − A)⁻¹ − c(w − A')⁻¹‖ ≤ cρ/(dist(w, σ(A))·dist(w, σ(A'))) ≤ ρ/max(|Im w|, g).
 */
export function registerEnergies(hull: RegisterHull, w: ComplexScalar, rho: number): RegisterEnergies {
  const top = hull.low.length - 1;
  const centre = new Float64Array(top + 1).fill(Number.NaN);
  let gap = Infinity;
  let exact = true;
  for (let v = 0; v <= top; v++) {
    const low = hull.low[v]!;
    const high = hull.high[v]!;
    if (Number.isNaN(low)) continue;
    centre[v] = (low + high) / 2;
    gap = Math.min(gap, distance(w, low, high));
    if (high - low > 1e-12 * Math.max(1, Math.abs(low), Math.abs(high))) exact = false;
  }
  const eta = Math.abs(w.im);
  if (gap === Infinity) gap = eta;
  const c = Math.max(eta, gap - rho);
  let rounding = 0;
  for (let v = 0; v <= top; v++) {
    const low = hull.low[v]!;
    const high = hull.high[v]!;
    if (Number.isNaN(low) || high === low) continue;
    rounding = Math.max(rounding, (c * (high - low)) / 2 / (distance(w, low, high) * Math.hypot(w.re - centre[v]!, w.im)));
  }
  return { top, w, centre, hull, gap, c, rounding, decomposition: rho / Math.max(eta, gap), exact };
}

/** True when some occupation has register value v. */
export function occupied(r: RegisterEnergies, v: number): boolean {
  return v <= r.top && !Number.isNaN(r.centre[v]!);
}

/** ry angle θ = 2 acos|f| and rz angle λ = −2 arg f, so rz(λ) ry(θ)|0> has f = c/(w − E*(v)) on |0>. */
export function flagAngles(r: RegisterEnergies, v: number): { theta: number; lambda: number } {
  const a = r.w.re - r.centre[v]!;
  const magnitude = Math.min(1, r.c / Math.hypot(a, r.w.im));
  return { theta: 2 * Math.acos(magnitude), lambda: -2 * Math.atan2(-r.w.im, a) };
}
