/**
 * adjacentTranspositions: a sequence of adjacent swaps realising a given permutation, found by odd-even
 * transposition sort (Knuth, TAOCP vol. 3, §5.3.4), i.e. a depth-≤n network of fermionic swaps.
 */

/**
 * Positions p (each meaning: swap the contents of p and p+1), in order, that move the item at position i to
 * position destination[i] for every i. `destination` must be a permutation of 0 … n−1.
 */
export function adjacentTranspositions(destination: readonly number[]): number[] {
  const keys = [...destination];
  const n = keys.length;
  const swaps: number[] = [];
  for (let round = 0; round < n; round++) {
    for (let p = round % 2; p + 1 < n; p += 2) {
      if (keys[p]! > keys[p + 1]!) {
        [keys[p], keys[p + 1]] = [keys[p + 1]!, keys[p]!];
        swaps.push(p);
      }
    }
  }
  return swaps;
}
