/**
 * exactJson: the one JSON object of `polewright exact --json` and of green.json under --out: the header
 * (tool, version, command, the inputs that determine the result), the model's name, the ground level with
 * its residual, G with bounds, G0, Σ with bounds and the diagonal spectral function A_ii(ω) with bounds.
 */
import type { ExactSolution } from '../../exact/solveExact.js';
import { spectralFunction } from '../../exact/spectralFunction.js';
import type { FermionModel, FrequencyGrid } from '../../model/FermionModel.js';
import { ERROR_DESCRIPTIONS, greenJson, type GreenJson } from '../../report/greenTables.js';
import { jsonHeader, type JsonHeader } from './jsonHeader.js';

/** The inputs of one exact solution: the model file as given and every setting actually used. */
export interface ExactInputs extends Record<string, unknown> {
  readonly file: string;
  readonly broadening: number;
  readonly grid: FrequencyGrid;
  /** The computed entries [i, j]; all n² unless --pairs chose some. */
  readonly pairs: readonly (readonly [number, number])[];
  readonly tolerance: number;
}

const EXTRA_DESCRIPTIONS = {
  residual: 'residual: the largest |H psi - E0 psi| over the ground vectors (Euclidean norm, model energy units)',
  nonInteracting: 'nonInteracting: G0_ij(omega + i eta) = (z - T)^-1 of the one-body part T, exact to rounding',
  spectral:
    'spectral: A_ii(omega) = -Im G_ii(omega + i eta) / pi for the computed diagonal entries; bounds: the bound on |G_ii - value| divided by pi, null where none',
} as const;

export type ExactJson = JsonHeader<ExactInputs> & { readonly model: string; readonly residual: number } & Omit<GreenJson, 'errors'> & {
    readonly nonInteracting: { readonly entries: { readonly i: number; readonly j: number; readonly values: [number, number][] }[] };
    readonly spectral: { readonly entries: { readonly i: number; readonly values: number[]; readonly bounds: (number | null)[] }[] };
    readonly errors: typeof ERROR_DESCRIPTIONS & typeof EXTRA_DESCRIPTIONS;
  };

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

export function exactJson(file: string, model: FermionModel, solution: ExactSolution, grid: FrequencyGrid): ExactJson {
  const { errors, ...green } = greenJson(solution);
  const inputs: ExactInputs = { file, broadening: solution.broadening, grid: { ...grid }, pairs: solution.pairs, tolerance: solution.tolerance };
  return {
    ...jsonHeader('exact', inputs),
    model: model.name,
    residual: solution.residual,
    ...green,
    nonInteracting: {
      entries: solution.nonInteracting.map((e) => ({ i: e.i, j: e.j, values: Array.from(e.re, (re, k): [number, number] => [re, e.im[k]!]) })),
    },
    spectral: {
      entries: solution.green
        .filter((e) => e.i === e.j)
        .map((e) => ({ i: e.i, values: Array.from(spectralFunction(e)), bounds: Array.from(e.bound, (b) => finiteOrNull(b / Math.PI)) })),
    },
    errors: { ...errors, ...EXTRA_DESCRIPTIONS },
  };
}
