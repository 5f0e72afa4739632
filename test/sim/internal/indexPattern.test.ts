// indexPattern/deposit: the enumeration visits exactly the indices whose fixed bits match.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { deposit, indexPattern } from '../../../src/sim/internal/indexPattern.js';

describe('indexPattern(n, fixed, value)', () => {
  it('enumerates each matching index exactly once and nothing else', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 9 }).chain((n) => fc.tuple(fc.constant(n), fc.subarray(Array.from({ length: n }, (_, k) => k)), fc.integer({ min: 0, max: 2 ** n - 1 }))), ([n, fixed, raw]) => {
        let value = 0;
        for (const q of fixed) value |= raw & (1 << q);
        const pattern = indexPattern(n, fixed, value);
        const visited: number[] = [];
        for (let o = 0; o < pattern.outer; o++) {
          const start = deposit(o * pattern.run, pattern.positions) | pattern.value;
          for (let i = start; i < start + pattern.run; i++) visited.push(i);
        }
        const expected = Array.from({ length: 2 ** n }, (_, i) => i).filter((i) => fixed.every((q) => ((i >> q) & 1) === ((value >> q) & 1)));
        expect(visited.sort((a, b) => a - b)).toEqual(expected);
      }),
      { numRuns: 200, seed: 7 },
    );
  });

  it('refuses a qubit fixed twice', () => {
    expect(() => indexPattern(3, [1, 1], 0)).toThrow(/used twice/);
  });
});
