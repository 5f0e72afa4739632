/**
 * greenCost: the logical cost of estimating G_ij(z) = G⁺ + G⁻ on one route — for each part the Hadamard test of
 * a_i (w − H)⁻¹ a_j† (particle, w = z + E0) or a_j† (w − H)⁻¹ a_i (hole, w = E0 − z), its resolvent built by the
 * caller's builder; counted on the hierarchy with cost overrides, lowered by the decomposition table, rotations
 * synthesised within the error budget, and repeated for the requested precision (plain sampling and amplitude estimation).
 * The ground-state preparation is not counted unless its Toffoli count is given.
 */
import { ancillaQubits, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { ladderEncoding } from '../blocks/builders/ladderEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import type { BEncodingReport } from '../resolvent/ResolventReport.js';
import type { OverrideRuleOptions } from './collectOverrides.js';
import { controlledCount } from './controlledCount.js';
import type { DecompositionOptions } from './decompositionTable.js';
import { errorBudget, type ErrorBudget } from './errorBudget.js';
import { sumCounts } from './HierarchyCount.js';
import { resourceTotals, type ResourceTotals } from './resourceTotals.js';
import { shotCount } from './shotCount.js';

/** What a route's resolvent builder returns: the encoding of (w − H)⁻¹ plus what it knows of its own construction, or why it has none. */
export type RouteResolvent = BuiltResolvent | UnavailableRoute;

/** A route that cannot be costed (e.g. no precision is reachable), with the reason for the user. */
export interface UnavailableRoute {
  readonly unavailable: string;
}

export interface BuiltResolvent {
  readonly encoding: BlockEncoding;
  /** Polynomial degree of the inversion (0 when none). */
  readonly degree: number;
  /** Calls of the inner block-encoding(s) per application, by factor name. */
  readonly queries: Readonly<Record<string, number>>;
  /** Register bits (energy register of a fast inverse; 0 when none). */
  readonly registerBits: number;
  /** Whether the encoding's error bound (operator units) meets the precision asked of it. */
  readonly precisionMet: boolean;
  /** Further facts the route states (δ, κ, bounds used), printed under the table. */
  readonly notes: readonly string[];
  /** Preconditioned route: which encoding B' got and both α's. */
  readonly bEncoding?: BEncodingReport;
}

export type ResolventBuilder = (w: ComplexScalar, options: { readonly precision: number; readonly electrons: number }) => RouteResolvent;

export interface GreenCostOptions extends DecompositionOptions, OverrideRuleOptions {
  readonly model: FermionModel;
  readonly pair: readonly [number, number];
  readonly z: ComplexScalar;
  /** Target ε on |ΔG_ij(z)|. */
  readonly precision: number;
  /** Ground energy used for the shifts (given, or a stated bound). */
  readonly groundEnergy: number;
  /** Toffolis of one ground-state preparation, when the user gives it (added to every run). */
  readonly prepToffoli?: number;
  readonly toffoliT?: 4 | 7;
  readonly build: ResolventBuilder;
}

export interface PartCost {
  readonly part: 'particle' | 'hole';
  readonly w: ComplexScalar;
  readonly electrons: number;
  readonly alpha: number;
  readonly encodingErrorBound: number;
  readonly degree: number;
  readonly queries: Readonly<Record<string, number>>;
  readonly registerBits: number;
  readonly precisionMet: boolean;
  readonly logicalQubits: number;
  readonly rotationError: number;
  /** One run of the Hadamard-test circuit. */
  readonly perRun: ResourceTotals;
  readonly plainShotsPerTest: number;
  readonly amplitudeEstimationCallsPerTest: number;
  readonly notes: readonly string[];
  /** As BuiltResolvent.bEncoding (preconditioned route). */
  readonly bEncoding?: BEncodingReport;
}

export interface GreenCost {
  readonly parts: readonly PartCost[];
  /** False when a part's encoding could only be costed at a coarser precision than its share of the budget. */
  readonly precisionMet: boolean;
  readonly budget: ErrorBudget;
  readonly logicalQubits: number;
  /** Per run of the costlier test circuit. */
  readonly toffoli: number;
  readonly tCount: number;
  readonly rotations: number;
  readonly alpha: number;
  readonly degree: number;
  readonly queries: Readonly<Record<string, number>>;
  /** Runs of test circuits in all (4 tests: Re and Im of both parts), plain sampling. */
  readonly shots: number;
  /** Calls of controlled-U in all by amplitude estimation. */
  readonly amplitudeEstimationCalls: number;
  /** Toffolis of the whole estimate: plain sampling, and amplitude estimation. */
  readonly totalToffoli: number;
  readonly totalToffoliAmplitudeEstimation: number;
  readonly prepToffoli: number | null;
  /** Preconditioned route: B's encoding in the costlier test circuit (the part whose per-run figures are shown). */
  readonly bEncoding?: BEncodingReport;
}

function partCost(part: 'particle' | 'hole', w: ComplexScalar, electrons: number, budget: ErrorBudget, options: GreenCostOptions): PartCost | UnavailableRoute {
  const { model, pair } = options;
  const [i, j] = pair;
  const resolvent = options.build(w, { precision: budget.encodingPerPart, electrons });
  if ('unavailable' in resolvent) return { unavailable: `${part} part: ${resolvent.unavailable}` };
  const encoding = resolvent.encoding;
  const first = part === 'particle' ? ladderEncoding(i, false, model.modes) : ladderEncoding(j, true, model.modes);
  const last = part === 'particle' ? ladderEncoding(j, true, model.modes) : ladderEncoding(i, false, model.modes);
  const roots = [encoding.block, first.block, last.block];
  // The test: controlled (first · R · last) = three controlled calls; ladder encodings have α = 1.
  const count = sumCounts(roots.map((block) => [controlledCount(block, options), 1] as const));
  const unsynthesised = resourceTotals(count, options);
  const alpha = encoding.alpha * first.alpha * last.alpha;
  const rotationError = unsynthesised.rotations === 0 ? 0.25 : Math.min(0.25, budget.synthesisPerPart / (alpha * unsynthesised.rotations));
  const perRun = resourceTotals(count, { ...options, rotationError });
  const shots = shotCount(alpha, budget.samplingPerEstimate);
  return {
    part,
    w,
    electrons,
    alpha,
    encodingErrorBound: encoding.errorBound,
    degree: resolvent.degree,
    queries: resolvent.queries,
    registerBits: resolvent.registerBits,
    precisionMet: resolvent.precisionMet,
    // system + ancillas of R, one ancilla per ladder encoding, the test qubit, the decompositions' peak work qubits.
    logicalQubits: model.modes + ancillaQubits(encoding) + 2 + 1 + perRun.extraAncillas,
    rotationError,
    perRun,
    plainShotsPerTest: shots.plainShots,
    amplitudeEstimationCallsPerTest: shots.amplitudeEstimationCalls,
    notes: resolvent.notes,
    ...(resolvent.bEncoding ? { bEncoding: resolvent.bEncoding } : {}),
  };
}

/**
 * The route's cost, or why it has none (a part whose resolvent is unavailable). A part is skipped when it is
 * identically zero: N = modes has no particle part, N = 0 no hole part.
 * @throws RangeError for a pair outside the modes or ε ≤ 0.
 */
export function greenCost(options: GreenCostOptions): GreenCost | UnavailableRoute {
  const { model, z, groundEnergy } = options;
  const [i, j] = options.pair;
  if (![i, j].every((m) => Number.isInteger(m) && m >= 0 && m < model.modes)) {
    throw new RangeError(`greenCost: pair (${i}, ${j}) is outside modes 0…${model.modes - 1}`);
  }
  const budget = errorBudget(options.precision);
  const parts: PartCost[] = [];
  const shifts: ['particle' | 'hole', ComplexScalar, number][] = [];
  if (model.electrons < model.modes) shifts.push(['particle', { re: z.re + groundEnergy, im: z.im }, model.electrons + 1]);
  if (model.electrons > 0) shifts.push(['hole', { re: groundEnergy - z.re, im: -z.im }, model.electrons - 1]);
  for (const [part, w, electrons] of shifts) {
    const cost = partCost(part, w, electrons, budget, options);
    if ('unavailable' in cost) return cost;
    parts.push(cost);
  }
  const prep = options.prepToffoli ?? 0;
  const worst = parts.reduce((a, b) => (b.perRun.tCount > a.perRun.tCount ? b : a));
  const tests = 2;
  const shots = parts.reduce((sum, p) => sum + tests * p.plainShotsPerTest, 0);
  const aeCalls = parts.reduce((sum, p) => sum + tests * p.amplitudeEstimationCallsPerTest, 0);
  const totalToffoli = parts.reduce((sum, p) => sum + tests * p.plainShotsPerTest * (p.perRun.toffoli + prep), 0);
  const totalToffoliAe = parts.reduce((sum, p) => sum + tests * p.amplitudeEstimationCallsPerTest * (p.perRun.toffoli + prep), 0);
  return {
    parts,
    precisionMet: parts.every((p) => p.precisionMet),
    budget,
    logicalQubits: Math.max(...parts.map((p) => p.logicalQubits)),
    toffoli: worst.perRun.toffoli + prep,
    tCount: worst.perRun.tCount + worst.perRun.toffoliT * prep,
    rotations: worst.perRun.rotations,
    alpha: Math.max(...parts.map((p) => p.alpha)),
    degree: Math.max(...parts.map((p) => p.degree)),
    queries: worst.queries,
    shots,
    amplitudeEstimationCalls: aeCalls,
    totalToffoli,
    totalToffoliAmplitudeEstimation: totalToffoliAe,
    prepToffoli: options.prepToffoli ?? null,
    ...(worst.bEncoding ? { bEncoding: worst.bEncoding } : {}),
  };
}
