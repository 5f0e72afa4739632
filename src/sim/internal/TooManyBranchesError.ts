/**
 * TooManyBranchesError: the exact outcome distribution would need more live measurement branches
 * than allowed; sampling trajectories (shots) still works.
 */
import { InputError } from '../../core/InputError.js';

export class TooManyBranchesError extends InputError {
  constructor(limit: number) {
    super(`the circuit's mid-circuit measurements and resets give more than ${limit} branches; sample it with shots instead (polewright run --shots N)`);
  }
}

export function isTooManyBranchesError(error: unknown): error is TooManyBranchesError {
  return error instanceof TooManyBranchesError;
}
