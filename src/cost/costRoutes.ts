/**
 * costRoutes: the two routes to (w − H)⁻¹ as the cost stage takes them — the resolvent stage's own plan and circuit
 * (resolventCost: the QSVT sequence with placeholder phases of the truncation-bound degree, times the fast inverse on the
 * preconditioned route) with its rigorous error bound. The cost stage's target is an error in operator units (on G), the
 * resolvent's precision is in projected-block units, ε = target/α, and α depends (weakly, through the fast inverse) on ε:
 * so the plan is redone with ε scaled by target/bound until its bound in operator units meets the target (at most
 * MAX_PLANS plans). When the fast inverse at its register cap cannot reach that precision the route is costed at the
 * smallest precision it can reach, and says so; when it reaches none the route is unavailable, with the reason.
 * The preconditioned route's B' is, by default, whichever of the Pauli LCU and the arithmetic encoding (B diagonal) gives
 * the route fewer Toffolis per application (controlled, as the Hadamard test calls it), counted here.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { isInputError } from '../core/InputError.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { MIN_PRECISION } from '../resolvent/planResolvent.js';
import { resolventCost, type ResolventCost } from '../resolvent/resolventCost.js';
import type { ResolventRoute } from '../resolvent/ResolventReport.js';
import { UnreachablePrecisionError } from '../resolvent/UnreachablePrecisionError.js';
import type { OverrideRuleOptions } from './collectOverrides.js';
import { controlledCount } from './controlledCount.js';
import type { DecompositionOptions } from './decompositionTable.js';
import type { ResolventBuilder, RouteResolvent } from './greenCost.js';
import { resourceTotals } from './resourceTotals.js';

export type RouteName = ResolventRoute;

export interface RouteOptions {
  /** Allowed operator-norm error of the encoded (w − H)⁻¹ (its bound times α). */
  readonly precision: number;
  /** Electron number of the sector the resolvent acts on (the preconditioned route's window). */
  readonly electrons: number;
}

/** How the routes are set up beyond the model and shift. */
export interface RouteSettings extends DecompositionOptions, OverrideRuleOptions {
  /** B' of the preconditioned route: 'cheaper' (default; fewer Toffolis per application × α², i.e. over all shots), 'pauli' or 'arithmetic'. */
  readonly bEncoding?: 'pauli' | 'arithmetic' | 'cheaper';
  /** The preconditioned route's electron-number window on the resolvent's sector (default true); false: the whole Fock space. */
  readonly window?: boolean;
}

const MAX_PLANS = 4;
/** Largest projected-block precision asked of the plan (it needs ε < 1). */
const MAX_BLOCK_PRECISION = 0.5;
/** Aim this far below the target when re-planning, so a slightly larger α after re-planning still meets it. */
const REPLAN_MARGIN = 0.98;

/** Toffolis of one controlled application, with the same overrides and decompositions as the cost itself. */
function toffoliCounter(settings: RouteSettings): (encoding: BlockEncoding) => number {
  return (encoding) => resourceTotals(controlledCount(encoding.block, settings), settings).toffoli;
}

function plan(model: FermionModel, w: ComplexScalar, route: RouteName, options: RouteOptions, settings: RouteSettings): ResolventCost {
  const window = route === 'preconditioned' && settings.window !== false ? { electrons: options.electrons } : {};
  const bEncoding = settings.bEncoding ?? 'cheaper';
  // The pruned flag rotation (one multi-controlled rotation per dyadic interval of register values) costs O(log ‖A‖);
  // the exact multiplexor the simulation prefers for small registers costs 2^m rotations, i.e. grows like ‖A‖/Δ.
  const at = (precision: number): ResolventCost =>
    resolventCost(model, w, { route, precision, reachablePrecision: true, fastInverse: { flagRotation: 'pruned' }, ...window, bEncoding, countToffoli: toffoliCounter(settings) });
  // The resolvent plans ε ≥ MIN_PRECISION only; a tighter target is reported as not met rather than planned for.
  const clamp = (eps: number): number => Math.max(MIN_PRECISION, Math.min(MAX_BLOCK_PRECISION, eps));
  let epsilon = clamp(options.precision);
  let cost = at(epsilon);
  for (let k = 1; k < MAX_PLANS && cost.report.errorBoundOperator > options.precision && cost.report.precision === epsilon; k++) {
    const next = clamp((REPLAN_MARGIN * epsilon * options.precision) / cost.report.errorBoundOperator);
    if (next === epsilon) break;
    epsilon = next;
    cost = at(epsilon);
  }
  return cost;
}

function notes(cost: ResolventCost, target: number): string[] {
  const r = cost.report;
  const lines = [
    `alpha_M = ${r.alphas.M.toPrecision(4)}; K = ${r.conditionBound.toPrecision(4)}; delta = ${r.delta.toExponential(2)}; degree ${r.degree} (truncation bound); bound on the encoding ${r.errorBoundOperator.toExponential(2)} (operator units)`,
  ];
  if (r.fastInverseBits !== null) {
    lines.push(`fast inverse: ${r.fastInverseBits}-bit energy register, alpha = ${r.alphas.fastInverse!.toPrecision(4)}, bound ${r.errorParts.fastInverse.toExponential(2)}; ||B'|| <= alpha_B' = ${r.alphas.B!.toPrecision(4)} (B' = B - b0 I, b0 = ${r.bShift.toPrecision(4)} moved into w); ${r.window ? `electron window ${r.window.min}..${r.window.max}` : 'whole Fock space'}`);
  }
  if (r.bEncoding) lines.push(bEncodingNote(r.bEncoding));
  if (r.precision !== r.requestedPrecision || r.errorBoundOperator > target) {
    lines.push(`PRECISION NOT MET: the encoding's error on G is bounded by ${r.errorBoundOperator.toExponential(2)} > the target ${target.toExponential(2)} (the fast inverse's register cap limits it); the figures are for that precision`);
  }
  return lines;
}

function bEncodingNote(b: NonNullable<ResolventCost['report']['bEncoding']>): string {
  const arithmetic = b.alphaArithmetic === null ? `arithmetic n/a (${b.notDiagonal ?? 'B not diagonal'})` : `arithmetic alpha = ${b.alphaArithmetic.toPrecision(4)}`;
  const counts = b.toffoli ? `; Toffoli per application: Pauli ${b.toffoli.pauli ?? 'n/a'}, arithmetic ${b.toffoli.arithmetic ?? 'n/a'}` : '';
  return `B' encoding used: ${b.used === 'pauli' ? 'Pauli LCU' : 'arithmetic (diagonal B)'} (Pauli alpha = ${b.alphaPauli.toPrecision(4)}, ${arithmetic}${counts})`;
}

function resolvent(model: FermionModel, w: ComplexScalar, route: RouteName, options: RouteOptions, settings: RouteSettings): RouteResolvent {
  let cost: ResolventCost;
  try {
    cost = plan(model, w, route, options, settings);
  } catch (error) {
    // A route that cannot be planned (an unreachable precision, an LCU beyond its size limit) is reported, not fatal.
    if (error instanceof UnreachablePrecisionError || isInputError(error)) return { unavailable: error.message };
    throw error;
  }
  const r = cost.report;
  const queries: Record<string, number> =
    route === 'direct' ? { 'w - H': r.queries.H } : { 'I - (w - A)^-1 B': r.queries.M, '(w - A)^-1 (fast inverse)': r.queries.fastInverse, B: r.queries.B };
  return {
    encoding: cost.encoding,
    degree: r.degree,
    queries,
    registerBits: r.fastInverseBits ?? 0,
    precisionMet: r.errorBoundOperator <= options.precision,
    notes: notes(cost, options.precision),
    ...(r.bEncoding ? { bEncoding: r.bEncoding } : {}),
  };
}

/** The builder of one route, as greenCost takes it. */
export function routeBuilder(model: FermionModel, route: RouteName, settings: RouteSettings = {}): ResolventBuilder {
  return (w, options) => resolvent(model, w, route, options, settings);
}
