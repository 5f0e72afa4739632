import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEEPEST_NESTING, locateJsonError } from '../../../src/model/internal/locateJsonError.js';

const isJson = (text: string): boolean => {
  try {
    JSON.parse(text);
    return true;
  } catch {
    return false;
  }
};

describe('locateJsonError(text)', () => {
  it('agrees with JSON.parse on which texts are valid', () => {
    const texts = fc.oneof(
      fc.json(),
      fc.tuple(fc.json(), fc.nat(), fc.constantFrom('', ',', '}', ']', '"', ':', 'x', '\n', '\u0001'))
        .map(([t, at, insert]) => t.slice(0, at % (t.length + 1)) + insert + t.slice(at % (t.length + 1))),
      fc.string(),
    );
    fc.assert(fc.property(texts, (text) => {
      expect(locateJsonError(text) === undefined).toBe(isJson(text));
    }), { numRuns: 500 });
  });

  it('counts lines and columns from 1', () => {
    expect(locateJsonError('[1,\n 2 3]')).toEqual({ line: 2, column: 4, reason: "expected ',' or ']', found \"3\"" });
    expect(locateJsonError('')).toEqual({ line: 1, column: 1, reason: 'expected a value, found end of input' });
  });

  it('reports nesting beyond DEEPEST_NESTING instead of overflowing the stack (fuzz corpus finding)', () => {
    const text = `${'['.repeat(20_000)}1${']'.repeat(19_999)}`;
    expect(locateJsonError(text)).toEqual({ line: 1, column: DEEPEST_NESTING + 1, reason: `arrays and objects nested deeper than ${DEEPEST_NESTING} levels` });
  });
});
