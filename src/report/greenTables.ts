/**
 * greenTables: the exact solver's outputs as text. greenJson is the one JSON object of
 * `polewright exact --json` and green.json; greenCsv has the columns omega,i,j,re,im,bound (one row
 * per frequency and computed entry, frequencies outermost; bound = the rigorous continued-fraction
 * truncation bound on |δG_ij|), numbers in shortest round-trip form. An infinite bound (no bound) is
 * written as null in JSON and Infinity in CSV.
 */
import type { ExactSolution } from '../exact/solveExact.js';
import type { SpinSectors } from '../exact/groundLevel.js';

/** What the error figures are, stated in every JSON output. */
export const ERROR_DESCRIPTIONS = {
  green:
    'bounds: rigorous bound on |G_ij - value| per frequency from cutting the continued fractions (Weyl-disk bound for the ' +
    'computed Lanczos coefficients); rounding in the Lanczos recurrence and the ground-state residual are not included',
  selfEnergy:
    'bounds: per frequency, a bound on every |Sigma_ij - value| propagated from the bounds on G by the inverse-perturbation ' +
    'bound |G^-1|^2 |dG| / (1 - |G^-1| |dG|) (Frobenius norms); null where it does not apply',
} as const;

export interface GreenJson {
  readonly groundEnergy: number;
  readonly degeneracy: number;
  readonly gap: number | null;
  readonly electrons: number;
  readonly modes: number;
  /** 'fixed': the model file fixes spin and the average is over that S_z sector only; 'all': every S_z sector counts; 'none': no spin blocks. */
  readonly spinSectors: SpinSectors;
  /** N↑ − N↓ the model file fixes, else null. */
  readonly spin: number | null;
  readonly groundSectors: readonly { up: number | null; down: number | null; dimension: number; states: number }[];
  readonly broadening: number;
  readonly tolerance: number;
  readonly frequencies: number[];
  readonly entries: { readonly i: number; readonly j: number; readonly values: [number, number][]; readonly bounds: (number | null)[] }[];
  readonly selfEnergy: {
    readonly entries: { readonly i: number; readonly j: number; readonly values: [number, number][] }[];
    readonly bounds: (number | null)[];
  } | null;
  readonly errors: typeof ERROR_DESCRIPTIONS;
}

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

export function greenJson(solution: ExactSolution): GreenJson {
  const sector = solution.sector;
  const fixed = sector.spinSectors === 'fixed' && sector.up !== null && sector.down !== null;
  return {
    groundEnergy: solution.groundEnergy,
    degeneracy: solution.degeneracy,
    gap: solution.gap,
    electrons: sector.electrons,
    modes: solution.modes,
    spinSectors: sector.spinSectors,
    spin: fixed ? sector.up! - sector.down! : null,
    groundSectors: sector.groundSectors.map((g) => ({ ...g })),
    broadening: solution.broadening,
    tolerance: solution.tolerance,
    frequencies: Array.from(solution.frequencies),
    entries: solution.green.map((e) => ({
      i: e.i,
      j: e.j,
      values: Array.from(e.re, (re, k): [number, number] => [re, e.im[k]!]),
      bounds: Array.from(e.bound, finiteOrNull),
    })),
    selfEnergy:
      solution.selfEnergy === null
        ? null
        : {
            entries: solution.selfEnergy.map((e) => ({ i: e.i, j: e.j, values: Array.from(e.re, (re, k): [number, number] => [re, e.im[k]!]) })),
            bounds: Array.from(solution.selfEnergyBound!, finiteOrNull),
          },
    errors: ERROR_DESCRIPTIONS,
  };
}

export function greenCsv(solution: ExactSolution): string {
  const lines = ['omega,i,j,re,im,bound'];
  solution.frequencies.forEach((w, k) => {
    for (const e of solution.green) lines.push(`${w},${e.i},${e.j},${e.re[k]!},${e.im[k]!},${e.bound[k]!}`);
  });
  return `${lines.join('\n')}\n`;
}
