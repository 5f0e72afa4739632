// Option parsers: both written forms of a complex option, finite parts, the upper half-plane check; whole numbers and
// ranges stated in every message together with what was written (also for a number beyond the double range).
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../src/core/InputError.js';
import {
  parseComplexOption,
  parseFiniteNumber,
  parseIntegerInRange,
  parseNonNegativeInteger,
  parseNumberInRange,
  parsePositiveInteger,
} from '../../src/cli/options.js';

function errorOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    if (isInputError(error)) return error.message;
    throw error;
  }
  throw new Error('expected an InputError');
}

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

describe('parseIntegerInRange, parsePositiveInteger, parseNonNegativeInteger(option, text, max)', () => {
  it('accepts decimal digits within the range, bounds included', () => {
    expect(parseIntegerInRange('--n', '7', 7, 9)).toBe(7);
    expect(parseIntegerInRange('--n', ' 9 ', 7, 9)).toBe(9);
    expect(parsePositiveInteger('--shots', '1')).toBe(1);
    expect(parseNonNegativeInteger('--seed', '0')).toBe(0);
  });

  it('states the range and what was written: "-1" and "0" alike for a positive option, never "non-negative"', () => {
    expect(errorOf(() => parsePositiveInteger('--shots', '-1', 1000))).toBe('--shots must be a whole number from 1 to 1000, got "-1"');
    expect(errorOf(() => parsePositiveInteger('--shots', '0', 1000))).toBe('--shots must be a whole number from 1 to 1000, got "0"');
    expect(errorOf(() => parseNonNegativeInteger('--seed', '-1', 5))).toBe('--seed must be a whole number from 0 to 5, got "-1"');
    for (const bad of ['1.5', '1e3', 'x', '', '1001', '99999999999999999999']) {
      expect(errorOf(() => parsePositiveInteger('--shots', bad, 1000))).toMatch(/^--shots must be a whole number from 1 to 1000, got "/);
    }
    expect(errorOf(() => parsePositiveInteger('--shots', '1e400', 1000))).toBe('--shots must be a whole number from 1 to 1000, got "1e400" (beyond the double range, ±1.8e308)');
  });

  it('without a stated max, says "at least" for a value too small and the range up to 2^53 − 1 for one too large', () => {
    expect(parsePositiveInteger('--n', String(Number.MAX_SAFE_INTEGER))).toBe(Number.MAX_SAFE_INTEGER);
    expect(errorOf(() => parsePositiveInteger('--n', '0'))).toBe('--n must be at least 1 (a whole number), got "0"');
    expect(errorOf(() => parseNonNegativeInteger('--n', '-2'))).toBe('--n must be at least 0 (a whole number), got "-2"');
    // 2^53 − 1 is the largest integer a double holds exactly (IEEE 754 binary64, 53-bit significand).
    expect(errorOf(() => parsePositiveInteger('--n', '9007199254740992'))).toBe('--n must be a whole number from 1 to 9007199254740991, got "9007199254740992"');
  });
});

describe('parseNumberInRange and parseFiniteNumber(option, text)', () => {
  it('accepts numbers within the range and states the range and the text otherwise', () => {
    expect(parseNumberInRange('--eta', '0.1', 1e-9, 1e6)).toBe(0.1);
    expect(errorOf(() => parseNumberInRange('--eta', '0', 1e-9, 1e6))).toBe('--eta must lie from 1e-9 to 1000000, got "0"');
    expect(errorOf(() => parseNumberInRange('--eta', 'abc', 1e-9, 1e6))).toBe('--eta must lie from 1e-9 to 1000000, got "abc"');
    expect(errorOf(() => parseNumberInRange('--eta', '-1e400', 1e-9, 1e6))).toMatch(/got "-1e400" \(beyond the double range/);
    expect(errorOf(() => parseFiniteNumber('--energy', '1e400'))).toBe('--energy must be a finite number, got "1e400" (beyond the double range, ±1.8e308)');
  });
});
