// fockSector and sectorIndex: dimensions from combinatorics and a bijective ranking.
import { describe, expect, it } from 'vitest';
import { fockSector } from '../../src/exact/fockSector.js';
import { sectorDimension } from '../../src/exact/sectorDimension.js';
import { sectorIndex } from '../../src/exact/sectorIndex.js';

describe('fockSector(spec)', () => {
  it('has dimension C(L, N↑)·C(L, N↓) for an (N, S_z) sector: 853,776 for L = 12 at half filling', () => {
    // Common practice: C(12, 6)² = 924² = 853,776 (the figure).
    expect(sectorDimension({ modes: 24, electrons: 12, lowModes: 12, lowCounts: [6] })).toBe(853776);
    expect(sectorDimension({ modes: 28, electrons: 14, lowModes: 14, lowCounts: [7] })).toBe(11778624);
  });

  it('ranks every N-electron pattern of n modes onto 0…C(n, N)−1 exactly once', () => {
    for (const [n, N] of [[7, 3], [8, 4], [5, 0], [6, 6]] as const) {
      const sector = fockSector({ modes: n, electrons: N, lowModes: Math.floor(n / 2), lowCounts: [0, 1, 2, 3, 4] });
      const seen = new Set<number>();
      for (let s = 0; s < 1 << n; s++) {
        let c = 0;
        for (let q = 0; q < n; q++) c += (s >> q) & 1;
        const r = sectorIndex(sector, s);
        if (c !== N) expect(r).toBe(-1);
        else seen.add(r);
      }
      // C(n, N) from Pascal's triangle (common practice).
      const binom = [1, 7, 21, 35];
      const expected = n === 7 ? binom[3] : n === 8 ? 70 : 1;
      expect(sector.dimension).toBe(expected);
      expect([...seen].sort((a, b) => a - b)).toEqual(Array.from({ length: expected! }, (_, k) => k));
    }
  });
});
