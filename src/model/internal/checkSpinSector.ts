// checkSpinSector: the preset sector (N electrons, spin S = N↑ − N↓ given by the file) must exist in two blocks of `block` modes.
import type { Problem } from './Problem.js';

/** Pushes a problem (at `spin`) when no state has N electrons with N↑ − N↓ = spin in two blocks of `block` modes. */
export function checkSpinSector(electrons: number, spin: number, block: number, problems: Problem[]): void {
  const path = ['spin'];
  if (Math.abs(spin) > electrons) {
    problems.push({ path, message: `spin ${spin} needs |spin| ≤ electrons = ${electrons}` });
  } else if ((electrons - spin) % 2 !== 0) {
    problems.push({ path, message: `spin ${spin} and electrons ${electrons} must have the same parity` });
  } else if ((electrons + Math.abs(spin)) / 2 > block) {
    problems.push({
      path,
      message: `${(electrons + spin) / 2} up and ${(electrons - spin) / 2} down electrons do not fit in ${block} modes per spin`,
    });
  }
}
