/**
 * InputError: a problem with what the user gave us (a file, an option, a value).
 * The CLI prints its message and exits with code 2; anything else is an internal error (exit 1).
 */
export class InputError extends Error {
  override readonly name: string = 'InputError';
  constructor(message: string) {
    super(message);
  }
}

export function isInputError(error: unknown): error is InputError {
  return error instanceof InputError;
}
