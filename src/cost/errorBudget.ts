/**
 * errorBudget: how the target precision ε on G_ij(z) is split. |ΔG| ≤ Σ over the two parts (particle, hole) of
 * α_part·‖encoding error‖ + α_part·R·ε_rot (R rotations per test circuit, errors adding in operator norm) + the
 * sampling error of the four real estimates (Re and Im of each part). Default shares: encoding (polynomial
 * approximation and register quantisation, as the resolvent's rigorous bound) ε/4, rotation synthesis ε/4, sampling ε/2.
 */
export interface BudgetShares {
  readonly encoding: number;
  readonly synthesis: number;
  readonly sampling: number;
}

export const DEFAULT_SHARES: BudgetShares = { encoding: 0.25, synthesis: 0.25, sampling: 0.5 };

export interface ErrorBudget {
  readonly target: number;
  /** Allowed error on G from each part's encoding (the resolvent's precision target). */
  readonly encodingPerPart: number;
  /** Allowed error on G from rotation synthesis in each part. */
  readonly synthesisPerPart: number;
  /** Allowed statistical error (one standard error, or the amplitude-estimation bound) of each of the 4 estimates. */
  readonly samplingPerEstimate: number;
}

/** @throws RangeError unless ε > 0 and the shares are positive and sum to 1. */
export function errorBudget(target: number, shares: BudgetShares = DEFAULT_SHARES): ErrorBudget {
  if (!(target > 0) || !Number.isFinite(target)) throw new RangeError(`errorBudget: target ${target} is not a positive number`);
  const sum = shares.encoding + shares.synthesis + shares.sampling;
  if (!(shares.encoding > 0 && shares.synthesis > 0 && shares.sampling > 0) || Math.abs(sum - 1) > 1e-12) {
    throw new RangeError('errorBudget: shares must be positive and sum to 1');
  }
  return {
    target,
    encodingPerPart: (shares.encoding * target) / 2,
    synthesisPerPart: (shares.synthesis * target) / 2,
    samplingPerEstimate: (shares.sampling * target) / 4,
  };
}
