/**
 * countedProducts: a sector Hamiltonian's product and fused Lanczos steps wrapped so that every
 * H product calls `onProduct` (the solvers report how many products they used).
 */
import type { SectorHamiltonian } from '../sectorHamiltonian.js';
import type { LanczosSteps } from './lanczos.js';
import type { CVec } from './vec.js';

export function countedProducts(
  hamiltonian: SectorHamiltonian,
  onProduct: () => void,
): { apply: (x: CVec, y: CVec) => void; steps: LanczosSteps | null } {
  const fused = hamiltonian.steps;
  return {
    apply: (x, y) => {
      onProduct();
      hamiltonian.apply(x, y);
    },
    steps:
      fused === null
        ? null
        : {
            ...fused,
            step: (x, c, y, s, z) => {
              onProduct();
              return fused.step(x, c, y, s, z);
            },
          },
  };
}
