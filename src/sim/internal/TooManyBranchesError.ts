/**
 * TooManyBranchesError: the exact outcome distribution would need more live measurement branches
 * than allowed; sampling trajectories (shots) still works.
 */
import { InputError } from '../../core/InputError.js';

export class TooManyBranchesError extends InputError {
  /** `reason` says why: how many branches may arise and what sets the limit. */
  constructor(limit: number, reason: string) {
    super(
      `exact outcome enumeration follows at most ${limit} measurement branches (${reason}); ` +
        'sample the circuit with shots instead (polewright run --shots N)',
    );
  }
}

export function isTooManyBranchesError(error: unknown): error is TooManyBranchesError {
  return error instanceof TooManyBranchesError;
}
