import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { adjacentTranspositions } from '../../../src/rotations/internal/adjacentTranspositions.js';

describe('adjacentTranspositions(destination)', () => {
  it('moves the item at position i to destination[i] using adjacent swaps only, at most n(n−1)/2 of them', () => {
    const permutation = fc.integer({ min: 1, max: 12 }).chain((n) => fc.shuffledSubarray([...Array(n).keys()], { minLength: n, maxLength: n }));
    fc.assert(
      fc.property(permutation, (destination) => {
        const items = destination.map((_, i) => i);
        const swaps = adjacentTranspositions(destination);
        for (const p of swaps) [items[p], items[p + 1]] = [items[p + 1]!, items[p]!];
        destination.forEach((d, i) => expect(items[d]).toBe(i));
        const n = destination.length;
        expect(swaps.length).toBeLessThanOrEqual((n * (n - 1)) / 2);
      }),
    );
  });
});
