/** sectorIndex: the basis index of an occupation pattern in a sector (−1 when it is not in it). */
import { popcount } from './internal/bits.js';
import type { FockSector } from './fockSector.js';

export function sectorIndex(sector: FockSector, state: number): number {
  const lowModes = sector.spec.lowModes;
  const lowPart = state & ((1 << lowModes) - 1);
  const highPart = state >>> lowModes;
  if (popcount(lowPart) + popcount(highPart) !== sector.spec.electrons) return -1;
  const b = sector.blockIndex[popcount(lowPart)] ?? -1;
  if (b < 0) return -1;
  const block = sector.blocks[b]!;
  return block.offset + sector.lowRank[lowPart]! * block.highPatterns.length + sector.highRank[highPart]!;
}
