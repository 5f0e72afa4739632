/**
 * shotCount: repetitions of one Hadamard test for a standard error ε on α·x, x = 2P − 1 = Re (or Im) <ψ,0|U|ψ,0>.
 * Plain sampling: x̂ has variance (1 − x²)/N ≤ 1/N, so N = ⌈α²/ε²⌉ (constant 1, one standard error).
 * Amplitude estimation (Brassard, Høyer, Mosca & Tapp, Contemp. Math. 305, 53, 2002, Thm. 12): with M applications of
 * the Grover iterate, |â − a| ≤ 2π√(a(1−a))/M + π²/M² ≤ π/M + π²/M² with probability ≥ 8/π²; a = P, so the error on
 * α·x is 2α(π/M + π²/M²) — M grows as 2πα/ε (Heisenberg scaling). Each Grover iterate runs the test circuit and its
 * inverse, i.e. 2 calls of controlled-U.
 */
export interface ShotCount {
  /** Runs of the test circuit by plain sampling. */
  readonly plainShots: number;
  /** Grover iterates M of amplitude estimation. */
  readonly amplitudeEstimationIterates: number;
  /** Calls of controlled-U by amplitude estimation: 2M + 1. */
  readonly amplitudeEstimationCalls: number;
}

export const AMPLITUDE_ESTIMATION_SOURCE = 'Brassard, Høyer, Mosca & Tapp, Contemp. Math. 305, 53 (2002), Thm. 12';

/** @throws RangeError unless α > 0 and ε > 0. */
export function shotCount(alpha: number, epsilon: number): ShotCount {
  if (!(alpha > 0) || !(epsilon > 0)) throw new RangeError(`shotCount: α = ${alpha} and ε = ${epsilon} must be positive`);
  const plainShots = Math.ceil((alpha / epsilon) ** 2);
  // 2α(u + u²) ≤ ε with u = π/M.
  const u = (Math.sqrt(1 + (2 * epsilon) / alpha) - 1) / 2;
  const iterates = Math.ceil(Math.PI / u);
  return { plainShots, amplitudeEstimationIterates: iterates, amplitudeEstimationCalls: 2 * iterates + 1 };
}
