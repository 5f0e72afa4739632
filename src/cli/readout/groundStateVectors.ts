/**
 * groundStateVectors: the exact solver's ground level as data for the readout stage — each ground vector, stored by
 * its Fock sector's index, moved to its full-basis index (qubit q = mode q), one vector per state of the level, over
 * every sector the level spans (a spin multiplet).
 */
import type { GroundLevel } from '../../exact/groundLevel.js';
import type { StateAmplitudes } from '../../readout/InitialState.js';

/** Vectors of length 2^modes. The caller checks that 2^modes fits (at most 14 modes for exact state preparation). */
export function groundStateVectors(ground: GroundLevel, modes: number): StateAmplitudes[] {
  const size = 2 ** modes;
  return ground.components.flatMap((component) => {
    const { sector } = component;
    const lowModes = sector.spec.lowModes;
    return component.states.map((state) => {
      const re = new Float64Array(size);
      const im = new Float64Array(size);
      for (const block of sector.blocks) {
        const highCount = block.highPatterns.length;
        block.lowPatterns.forEach((low, lowRank) => {
          block.highPatterns.forEach((high, highRank) => {
            const from = block.offset + lowRank * highCount + highRank;
            const to = low | (high << lowModes);
            re[to] = state.re[from]!;
            im[to] = state.im === null ? 0 : state.im[from]!;
          });
        });
      }
      return { re, im };
    });
  });
}
