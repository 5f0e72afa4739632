/**
 * seededRandom: a deterministic stream of doubles in [0, 1) from an integer seed
 * (xoroshiro128+ from pure-rand), so the same seed always gives the same samples.
 */
import { unsafeUniformIntDistribution, xoroshiro128plus } from 'pure-rand';

export interface RandomSource {
  /** Next double, uniform in [0, 1), with 53 random bits. */
  next(): number;
}

export function seededRandom(seed: number): RandomSource {
  const generator = xoroshiro128plus(seed | 0);
  return {
    next(): number {
      const high = unsafeUniformIntDistribution(0, (1 << 26) - 1, generator);
      const low = unsafeUniformIntDistribution(0, (1 << 27) - 1, generator);
      return (high * 134217728 + low) / 9007199254740992;
    },
  };
}
