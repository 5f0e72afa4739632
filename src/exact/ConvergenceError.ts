/**
 * ConvergenceError: an iterative solver stopped short of its tolerance on valid input. The message
 * says what was reached and what to try; `polewright exact` prints it and exits 1 (not an input
 * error, not an internal error).
 */
export class ConvergenceError extends Error {
  override readonly name: string = 'ConvergenceError';
}

export function isConvergenceError(error: unknown): error is ConvergenceError {
  return error instanceof ConvergenceError;
}
