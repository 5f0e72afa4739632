// sampleOutcomes(probabilities, shots, seed): deterministic per seed, never draws impossible
// outcomes, and matches the distribution within statistical error.
import { describe, expect, it } from 'vitest';
import { sampleOutcomes } from '../../src/sim/sampleOutcomes.js';

describe('sampleOutcomes(probabilities, shots, seed)', () => {
  const p = [0.1, 0, 0.6, 0.3];

  it('gives identical counts for the same seed and different counts for another seed', () => {
    const a = sampleOutcomes(p, 1000, 42);
    expect([...sampleOutcomes(p, 1000, 42)]).toEqual([...a]);
    expect([...sampleOutcomes(p, 1000, 43)]).not.toEqual([...a]);
  });

  it('counts sum to the shots and a zero-probability outcome is never drawn', () => {
    const counts = sampleOutcomes(p, 5000, 1);
    expect(counts.reduce((s, c) => s + c, 0)).toBe(5000);
    expect(counts[1]).toBe(0);
  });

  it('each count lies within 5 binomial standard deviations of shots·p', () => {
    // Binomial variance shots·p·(1−p) (common practice).
    const shots = 20000;
    const counts = sampleOutcomes(p, shots, 9);
    p.forEach((q, x) => {
      const sigma = Math.sqrt(shots * q * (1 - q));
      expect(Math.abs(counts[x]! - shots * q)).toBeLessThanOrEqual(5 * sigma + 1e-9);
    });
  });

  it('normalises unnormalised weights and refuses negative weights or an all-zero distribution', () => {
    const counts = sampleOutcomes([2, 2], 4000, 5);
    expect(Math.abs(counts[0]! - 2000)).toBeLessThan(5 * Math.sqrt(1000));
    expect(() => sampleOutcomes([0.5, -0.1], 10, 1)).toThrow(RangeError);
    expect(() => sampleOutcomes([0, 0], 10, 1)).toThrow(RangeError);
  });
});
