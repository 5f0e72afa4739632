/**
 * compareRoutes: the cost of G_ij(z) on both routes for one model (a route that cannot be costed says why), plus every
 * assumption the figures rest on, written out for the user. Never solves the model: E0 is the caller's or the rigorous
 * Pauli lower bound (groundEnergyBound).
 */
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import type { OverrideRuleOptions } from './collectOverrides.js';
import { routeBuilder, type RouteName, type RouteSettings } from './costRoutes.js';
import type { DecompositionOptions } from './decompositionTable.js';
import { DEFAULT_SHARES } from './errorBudget.js';
import { greenCost, type GreenCost, type UnavailableRoute } from './greenCost.js';
import { groundEnergyBound } from './groundEnergyBound.js';
import { ROTATION_SYNTHESIS_SOURCE } from './rotationSynthesis.js';
import { AMPLITUDE_ESTIMATION_SOURCE } from './shotCount.js';

export interface CompareOptions extends DecompositionOptions, OverrideRuleOptions {
  readonly pair: readonly [number, number];
  readonly z: ComplexScalar;
  readonly precision: number;
  /** Ground energy; omitted: the Pauli lower bound. */
  readonly energy?: number;
  readonly prepToffoli?: number;
  readonly toffoliT?: 4 | 7;
  /** B' of the preconditioned route (default 'cheaper'). */
  readonly bEncoding?: RouteSettings['bEncoding'];
  /** The preconditioned route's electron-number window (default true); false: the whole Fock space. */
  readonly window?: boolean;
}

export interface RouteComparison {
  readonly routes: Readonly<Record<RouteName, GreenCost | UnavailableRoute>>;
  readonly groundEnergy: number;
  readonly groundEnergySource: 'given' | 'lower bound';
  readonly assumptions: readonly string[];
}

export const ROUTES: readonly RouteName[] = ['preconditioned', 'direct'];

export function compareRoutes(model: FermionModel, options: CompareOptions): RouteComparison {
  const given = options.energy !== undefined;
  const groundEnergy = options.energy ?? groundEnergyBound(model);
  // The route's own Toffoli counts (for the cheaper B') use the same decomposition and override options as the totals.
  const settings: RouteSettings = { ...options, bEncoding: options.bEncoding ?? 'cheaper', window: options.window ?? true };
  const cost = (route: RouteName): GreenCost | UnavailableRoute =>
    greenCost({ ...options, model, groundEnergy, build: routeBuilder(model, route, settings) });
  const routes = { preconditioned: cost('preconditioned'), direct: cost('direct') };
  const toffoliT = options.toffoliT ?? 4;
  const assumptions = [
    given
      ? `E0 = ${groundEnergy} as given (--energy).`
      : `E0 = ${groundEnergy.toPrecision(6)}: a rigorous lower bound (identity coefficient minus the other Pauli coefficients' 1-norm), not the ground energy; give --energy for the real shifts.`,
    options.prepToffoli === undefined
      ? 'Ground-state preparation is NOT counted (give --prep-toffoli N to add N Toffolis per run).'
      : `Ground-state preparation: ${options.prepToffoli} Toffolis per run, as given.`,
    `Error budget on |dG|: encoding (the resolvent's rigorous bound: polynomial, fast-inverse quantisation carried through the inverse) ${DEFAULT_SHARES.encoding}, rotation synthesis ${DEFAULT_SHARES.synthesis}, sampling ${DEFAULT_SHARES.sampling} of epsilon; each split evenly over the particle and hole parts (and Re/Im for sampling).`,
    `Rotations: T per rotation = ceil(3 log2(1/eps_rot) + log2 log2(1/eps_rot) + 4) (${ROTATION_SYNTHESIS_SOURCE}; the +log log + 4 is our allowance).`,
    `Toffoli = ${toffoliT} T (${toffoliT === 4 ? 'measurement-based uncomputation, Jones 2013 / Gidney 2018' : 'Amy et al. 2013'}); multi-controlled gates: ${options.multiControl ?? 'measured'} ladder (src/cost/decompositionTable.ts).`,
    'SELECT of every LCU costed by unary iteration (Babbush et al. 2018), L - 1 Toffolis; PREPARE as simulated (uniformly controlled rotations).',
    `Shots: plain sampling ceil(alpha^2/eps_s^2) per test (one standard error); amplitude estimation 2M + 1 controlled-U calls with M from ${AMPLITUDE_ESTIMATION_SOURCE} (success probability 8/pi^2).`,
    "Circuits are the resolvent stage's own (src/resolvent/resolventCost.ts): the real QSVT sequence with placeholder phases (counted as arbitrary rotations), its degree the Childs-Kothari-Somma truncation bound (an upper bound on the built degree), times the fast inverse on the preconditioned route; K and delta from ||(w - H)^-1|| <= 1/eta and ||B'|| <= alpha_B' of B' = B - b0 I (b0 moved into w: B's identity coefficient for the Pauli LCU, the centre of its range for the arithmetic encoding); the fast inverse's flag rotation pruned to dyadic intervals (O(log ||A||) rotations).",
    `Preconditioned route: ${settings.window ? 'the fast inverse and B\' act on the electron window of each part (N + 1 particle, N - 1 hole; an electron counter and a window qubit)' : 'the whole Fock space (no electron window, --whole-fock)'}; B' = ${settings.bEncoding === 'cheaper' ? 'whichever of the Pauli LCU and the arithmetic encoding (B diagonal: controlled constant additions and a signed flag rotation, alpha = beta >= max|B - b0| on the window) gives fewer Toffolis over the whole readout (Toffolis per application times alpha^2, to which the shots are proportional)' : settings.bEncoding === 'arithmetic' ? 'the arithmetic encoding when B is diagonal (else the Pauli LCU)' : 'the Pauli LCU'}.`,
  ];
  return { routes, groundEnergy, groundEnergySource: given ? 'given' : 'lower bound', assumptions };
}
