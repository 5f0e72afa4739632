// checkSpinSector: the preset sector (N electrons, spin S = N↑ − N↓) must exist in two blocks of `block` modes.
import type { Problem } from './Problem.js';

/** Returns S (default N mod 2, i.e. one extra up electron when N is odd) after pushing any problems. */
export function checkSpinSector(electrons: number, spin: number | undefined, block: number, problems: Problem[]): number {
  const s = spin ?? electrons % 2;
  const path = spin === undefined ? ['electrons'] : ['spin'];
  if (Math.abs(s) > electrons) {
    problems.push({ path, message: `spin ${s} needs |spin| ≤ electrons = ${electrons}` });
  } else if ((electrons - s) % 2 !== 0) {
    problems.push({ path, message: `spin ${s} and electrons ${electrons} must have the same parity` });
  } else if ((electrons + Math.abs(s)) / 2 > block) {
    problems.push({
      path,
      message: `${(electrons + s) / 2} up and ${(electrons - s) / 2} down electrons do not fit in ${block} modes per spin`,
    });
  }
  return s;
}
