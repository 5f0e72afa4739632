/**
 * fockSector: the Fock basis of a sector with fixed electron number and a set of allowed electron
 * counts in the low modes (the spin-up block for presets), ranked with split lookup tables.
 */
import { popcount } from './internal/bits.js';
import { binomial } from './internal/binomial.js';

/**
 * Which states a sector holds: `electrons` electrons in `modes` modes, the modes split into the low
 * ones 0…lowModes−1 and the high ones; a state belongs when its number of low electrons is in
 * `lowCounts` (all feasible counts: the electron-number sector; one count: an (N, S_z) sector).
 */
export interface SectorSpec {
  readonly modes: number;
  readonly electrons: number;
  readonly lowModes: number;
  readonly lowCounts: readonly number[];
}

/** States with `lowCount` low electrons: index offset + lowRank·highPatterns.length + highRank. */
export interface SectorBlock {
  readonly lowCount: number;
  readonly offset: number;
  /** Low occupation patterns with `lowCount` bits, ascending. */
  readonly lowPatterns: Int32Array;
  /** High occupation patterns (in high-mode coordinates) with electrons − lowCount bits, ascending. */
  readonly highPatterns: Int32Array;
}

export interface FockSector {
  readonly spec: SectorSpec;
  readonly dimension: number;
  readonly blocks: readonly SectorBlock[];
  /** blockIndex[k] = index into blocks of the block with k low electrons, or −1. */
  readonly blockIndex: Int32Array;
  /** lowRank[p] = position of pattern p among the low patterns with the same popcount. */
  readonly lowRank: Int32Array;
  /** highRank[p] = position of p among high patterns with the same popcount. */
  readonly highRank: Int32Array;
}

/** Patterns of `width` bits grouped by popcount, each group ascending, and each pattern's rank. */
function patternTables(width: number): { byCount: Int32Array[]; rank: Int32Array } {
  const size = 1 << width;
  const byCount: Int32Array[] = [];
  const fill = new Int32Array(width + 1);
  for (let k = 0; k <= width; k++) byCount.push(new Int32Array(binomial(width, k)));
  const rank = new Int32Array(size);
  for (let p = 0; p < size; p++) {
    const k = popcount(p);
    rank[p] = fill[k]!;
    byCount[k]![fill[k]!] = p;
    fill[k]! += 1;
  }
  return { byCount, rank };
}

/** Builds the sector's ranking tables. Modes must be ≤ 30 (patterns are 32-bit integers). */
export function fockSector(spec: SectorSpec): FockSector {
  const { modes, electrons, lowModes } = spec;
  if (modes > 30) throw new RangeError(`fockSector: at most 30 modes are supported, got ${modes}`);
  const low = patternTables(lowModes);
  const high = patternTables(modes - lowModes);
  const blocks: SectorBlock[] = [];
  const blockIndex = new Int32Array(lowModes + 1).fill(-1);
  let offset = 0;
  const counts = [...new Set(spec.lowCounts)].sort((a, b) => a - b);
  for (const k of counts) {
    const h = electrons - k;
    if (k < 0 || k > lowModes || h < 0 || h > modes - lowModes) continue;
    const block = { lowCount: k, offset, lowPatterns: low.byCount[k]!, highPatterns: high.byCount[h]! };
    blockIndex[k] = blocks.length;
    blocks.push(block);
    offset += block.lowPatterns.length * block.highPatterns.length;
  }
  return {
    spec: { modes, electrons, lowModes, lowCounts: counts },
    dimension: offset,
    blocks,
    blockIndex,
    lowRank: low.rank,
    highRank: high.rank,
  };
}
