/**
 * fuzzRandom: the seeded choices the fuzz generators make (integers, picks, coin flips), all drawn from one
 * seededRandom stream per input so that (corpus seed, index) reproduces the input byte for byte.
 */
import { seededRandom } from '../../src/core/seededRandom.js';

export interface FuzzRandom {
  /** Uniform integer in 0 … n − 1. */
  int(n: number): number;
  /** True with probability p. */
  chance(p: number): boolean;
  /** One element of a non-empty list. */
  pick<T>(items: readonly T[]): T;
}

/** A 32-bit integer hash (the finaliser of MurmurHash3, Appleby): nearby seeds give unrelated generator states. */
function mix(value: number): number {
  let h = value | 0;
  h = Math.imul(h ^ (h >>> 16), 0x85ebca6b);
  h = Math.imul(h ^ (h >>> 13), 0xc2b2ae35);
  return (h ^ (h >>> 16)) | 0;
}

/** The stream of input `index` of corpus `corpusSeed`. */
export function fuzzRandom(corpusSeed: number, index: number): FuzzRandom {
  const source = seededRandom(mix(mix(corpusSeed) + index));
  const int = (n: number): number => Math.floor(source.next() * n);
  return {
    int,
    chance: (p) => source.next() < p,
    pick: (items) => items[int(items.length)]!,
  };
}
