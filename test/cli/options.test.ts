// parseComplexOption: both written forms of a complex option, finite parts, the upper half-plane check.
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../src/core/InputError.js';
import { parseComplexOption } from '../../src/cli/options.js';

function messageOf(text: string, upper = false): string {
  try {
    parseComplexOption('--z', text, upper);
  } catch (error) {
    if (isInputError(error)) return error.message;
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('parseComplexOption(option, text, upperHalfPlane)', () => {
  it('reads "re,im" and "a+bi" forms alike', () => {
    const cases: [string, number, number][] = [
      ['0.3,0.5', 0.3, 0.5],
      ['0.3+0.5i', 0.3, 0.5],
      ['0.3 - 0.5i', 0.3, -0.5],
      ['-2e-1+1e1i', -0.2, 10],
      ['1+i', 1, 1],
      ['-i', 0, -1],
      ['2.5i', 0, 2.5],
      ['.5', 0.5, 0],
      [' -1 , 2 ', -1, 2],
    ];
    for (const [text, re, im] of cases) expect(parseComplexOption('--z', text)).toEqual({ re, im });
  });

  it('refuses malformed or non-finite text naming the option, and im ≤ 0 in the upper half-plane', () => {
    for (const bad of ['', 'abc', '--1', '1+i+i', '1,2,3', '1,', 'Infinity', '1e400+i', '1+NaNi', 'i2']) {
      expect(messageOf(bad)).toMatch(/^--z must be a complex number/);
    }
    expect(messageOf('0.3-0.1i', true)).toMatch(/--z needs a positive imaginary part/);
    expect(messageOf('0.3,0', true)).toMatch(/--z needs a positive imaginary part/);
    expect(parseComplexOption('--z', '0.3+0.1i', true)).toEqual({ re: 0.3, im: 0.1 });
  });
});
