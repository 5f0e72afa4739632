// resolventCheckEncodings: the four inverse block-encodings `polewright check` verifies for a model — (w − H)⁻¹ by the
// preconditioned and the direct route, each at the particle shift w⁺ = z + E0 and the hole shift w⁻ = E0 − z.
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { greensShifts } from '../inversion/greensShifts.js';
import { resolventEncoding, type ResolventEncoding, type ResolventOptions } from './resolventEncoding.js';

export interface ResolventCheckOptions {
  /** Ground energy in the model's electron-number sector. */
  readonly E0: number;
  /** Default: the frequency grid's midpoint + iη. */
  readonly z?: ComplexScalar;
  /** ε of every row (default 1e-2). */
  readonly precision?: number;
  /** Build the preconditioned rows on their electron window (default false: whole Fock space, fewer qubits). */
  readonly window?: boolean;
  /** Passed to every resolventEncoding (route, precision and window are set per row). */
  readonly resolvent?: Omit<ResolventOptions, 'route' | 'precision' | 'electrons'>;
}

export interface ResolventCheckRow {
  readonly label: string;
  readonly encoding: ResolventEncoding;
  /** The electron number of the Green's-function sector whose columns a check compares: N + 1 (particle) or N − 1 (hole), clamped to 0…modes. */
  readonly electrons: number;
}

/** A row before its encoding is built (building may fail, e.g. when the polynomial degree exceeds its cap). */
export interface ResolventCheckPlan {
  readonly label: string;
  readonly route: ResolventOptions['route'];
  readonly w: ComplexScalar;
  readonly electrons: number;
  /** Builds the row, with `overrides` (e.g. a window and a condition bound) on top of its options. @throws RangeError as resolventEncoding. */
  readonly build: (overrides?: Pick<ResolventOptions, 'electrons' | 'conditionBound'>) => ResolventEncoding;
}

/**
 * Rows labelled exactly "inverse, preconditioned (particle)", "inverse, preconditioned (hole)", "inverse, direct (particle)",
 * "inverse, direct (hole)", in that order, not yet built.
 */
export function resolventCheckPlans(model: FermionModel, options: ResolventCheckOptions): ResolventCheckPlan[] {
  const z = options.z ?? { re: (model.grid.from + model.grid.to) / 2, im: model.broadening };
  const { particle, hole } = greensShifts(options.E0, z);
  const precision = options.precision ?? 1e-2;
  const sector = (N: number): number => Math.min(model.modes, Math.max(0, N));
  const plan = (route: ResolventOptions['route'], w: ComplexScalar, N: number, part: string): ResolventCheckPlan => {
    const label = `inverse, ${route} (${part})`;
    const electrons = sector(N);
    const build = (overrides: Pick<ResolventOptions, 'electrons' | 'conditionBound'> = {}) =>
      resolventEncoding(model, w, {
        ...options.resolvent,
        route,
        precision,
        ...(options.window === true && route === 'preconditioned' ? { electrons } : {}),
        ...overrides,
        label,
      });
    return { label, route, w, electrons, build };
  };
  return [
    plan('preconditioned', particle, model.electrons + 1, 'particle'),
    plan('preconditioned', hole, model.electrons - 1, 'hole'),
    plan('direct', particle, model.electrons + 1, 'particle'),
    plan('direct', hole, model.electrons - 1, 'hole'),
  ];
}

/**
 * The rows of resolventCheckPlans, built. A row is correct when the simulated projected block, on the columns of its
 * sector, is within the encoding's `errorBound` of exact()/α.
 */
export function resolventCheckEncodings(model: FermionModel, options: ResolventCheckOptions): ResolventCheckRow[] {
  return resolventCheckPlans(model, options).map(({ label, electrons, build }) => ({ label, encoding: build(), electrons }));
}
