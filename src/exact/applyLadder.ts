/**
 * applyLadder: out += c · a_m† x (dagger) or out += c · a_m x, mapping a vector of one Fock sector
 * into another, with the Jordan–Wigner sign (−1)^{#occupied modes below m}.
 */
import { popcount } from './internal/bits.js';
import type { CVec } from './internal/vec.js';
import type { FockSector } from './fockSector.js';
import { sectorIndex } from './sectorIndex.js';

export function applyLadder(
  from: FockSector,
  to: FockSector,
  mode: number,
  dagger: boolean,
  x: CVec,
  cr: number,
  ci: number,
  out: CVec,
): void {
  if (to.spec.electrons !== from.spec.electrons + (dagger ? 1 : -1)) {
    throw new Error('applyLadder: target sector has the wrong electron number');
  }
  const lowModes = from.spec.lowModes;
  const bit = 1 << mode;
  for (const block of from.blocks) {
    const D = block.highPatterns.length;
    for (let lr = 0; lr < block.lowPatterns.length; lr++) {
      const p = block.lowPatterns[lr]!;
      for (let r = 0; r < D; r++) {
        const s = p | (block.highPatterns[r]! << lowModes);
        if (((s & bit) !== 0) === dagger) continue;
        const idx = block.offset + lr * D + r;
        const a = x.re[idx]!;
        const b = x.im === null ? 0 : x.im[idx]!;
        if (a === 0 && b === 0) continue;
        const to_ = sectorIndex(to, s ^ bit);
        if (to_ < 0) throw new Error('applyLadder: target sector misses a state');
        const sign = popcount(s & (bit - 1)) & 1 ? -1 : 1;
        out.re[to_]! += sign * (cr * a - ci * b);
        if (out.im !== null) out.im[to_]! += sign * (cr * b + ci * a);
        else if (ci !== 0 || b !== 0) throw new Error('applyLadder: complex result needs a complex output');
      }
    }
  }
}
