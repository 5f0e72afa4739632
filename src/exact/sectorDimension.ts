/** sectorDimension: the number of Fock states of a sector, computed without building it. */
import { binomial } from './internal/binomial.js';
import type { SectorSpec } from './fockSector.js';

/** Σ over the allowed low counts k of C(lowModes, k)·C(modes − lowModes, electrons − k). */
export function sectorDimension(spec: SectorSpec): number {
  let dim = 0;
  for (const k of spec.lowCounts) {
    dim += binomial(spec.lowModes, k) * binomial(spec.modes - spec.lowModes, spec.electrons - k);
  }
  return dim;
}
