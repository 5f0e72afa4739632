// inputErrorMessage: runs a call that must throw an InputError and returns its message (the test fails otherwise).
import { expect } from 'vitest';
import { isInputError } from '../../src/core/InputError.js';

export function inputErrorMessage(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(isInputError(error)).toBe(true);
    return (error as Error).message;
  }
  throw new Error('expected an input error');
}
