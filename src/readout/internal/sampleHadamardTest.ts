/**
 * sampleHadamardTest: the outcome of `shots` runs of one Hadamard test whose P(bit = 0) is known, as a binomial draw
 * through the project's seeded generator, and the estimate 2k/N − 1 of Re or Im <U> with its standard error.
 */
import { sampleOutcomes } from '../../sim/sampleOutcomes.js';

export interface SampledTest {
  /** Runs that measured 0. */
  readonly zeros: number;
  /** 2·zeros/shots − 1. */
  readonly estimate: number;
  /**
   * Standard error of the estimate, 2·sqrt(p̃(1 − p̃)/N) with p̃ = (zeros + 1)/(N + 2), so that a run of all zeros or all
   * ones still reports a nonzero spread (the binomial variance 4p(1 − p)/N of 2p̂ − 1, common practice).
   */
  readonly stdError: number;
}

export function sampleHadamardTest(probabilityZero: number, shots: number, seed: number): SampledTest {
  const p = Math.min(1, Math.max(0, probabilityZero));
  const zeros = sampleOutcomes([p, 1 - p], shots, seed)[0]!;
  const smoothed = (zeros + 1) / (shots + 2);
  return { zeros, estimate: (2 * zeros) / shots - 1, stdError: 2 * Math.sqrt((smoothed * (1 - smoothed)) / shots) };
}
