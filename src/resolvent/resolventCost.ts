/**
 * resolventCost: resolventEncoding's report and circuit structure without computing the polynomial or its phases, for
 * costing models and shifts whose degree is too high to build. The plan (planResolvent) is the same: the factor
 * encodings are built (lazy exact(), no dense matrices), K, δ and the precision split are the same. The degree is
 * Childs–Kothari–Somma's truncation bound at the same δ and ε (inverseDegreeBound, an upper bound on the built degree);
 * α of the inverse is 1/(s α_M) with s ≈ supTarget·δ; the error bound is the plan's rigorous one with s < δ. The
 * encoding is the built route's circuit — qsvtInverseStructure of M (the real QSVT sequence with placeholder phases),
 * times F on the preconditioned route, exactly as resolventEncoding composes it — for counting only: exact() throws.
 * `bEncoding: 'cheaper'` costs the preconditioned route with B' as the Pauli LCU and as the arithmetic encoding (when B is
 * diagonal) and keeps the one whose readout needs fewer Toffolis in all — Toffolis per application, counted by the caller's
 * `countToffoli` (the cost stage's counter; this stage does not count), times α², to which the shots are proportional; a
 * route that cannot be planned one way is costed the other way.
 */
import { ancillaQubits, type BlockEncoding } from '../blocks/BlockEncoding.js';
import { productEncoding } from '../blocks/combine/productEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { inverseDegreeBound } from '../qsvt/inverseDegreeBound.js';
import { relativeInverseError } from '../qsvt/qsvtInverse.js';
import { qsvtInverseStructure } from '../qsvt/qsvtInverseStructure.js';
import { planResolvent, type ResolventOptions } from './planResolvent.js';
import type { ResolventReport } from './ResolventReport.js';
import { UnreachablePrecisionError } from './UnreachablePrecisionError.js';

export interface ResolventCostOptions extends Omit<ResolventOptions, 'bEncoding'> {
  /** As ResolventOptions, or 'cheaper' (preconditioned route; needs countToffoli). Default 'pauli'. */
  readonly bEncoding?: 'pauli' | 'arithmetic' | 'cheaper';
  /** Toffolis of one application of an encoding (for 'cheaper'). */
  readonly countToffoli?: (encoding: BlockEncoding) => number;
}

export interface ResolventCost {
  readonly report: ResolventReport;
  /** The route's circuit with placeholder phases, α = report.alphas.total, errorBound = report.errorBound. */
  readonly encoding: BlockEncoding;
}

/**
 * @throws as planResolvent (RangeError, UnreachablePrecisionError; with 'cheaper', the Pauli route's error when neither
 *   way can be planned); RangeError for 'cheaper' without countToffoli. The degree cap does not apply.
 */
export function resolventCost(model: FermionModel, w: ComplexScalar, options: ResolventCostOptions): ResolventCost {
  const { bEncoding, countToffoli, ...rest } = options;
  if (bEncoding !== 'cheaper' || options.route !== 'preconditioned') return costWith(model, w, { ...rest, ...(bEncoding === 'arithmetic' ? { bEncoding } : {}) });
  if (!countToffoli) throw new RangeError("resolventCost: bEncoding 'cheaper' needs countToffoli");
  const attempt = (choice: 'pauli' | 'arithmetic'): ResolventCost | UnreachablePrecisionError => {
    try {
      return costWith(model, w, { ...rest, bEncoding: choice });
    } catch (error) {
      if (error instanceof UnreachablePrecisionError) return error;
      throw error;
    }
  };
  const pauli = attempt('pauli');
  const arithmetic = pauli instanceof UnreachablePrecisionError || (pauli.report.bEncoding?.alphaArithmetic ?? null) !== null ? attempt('arithmetic') : null;
  const usable = (c: ResolventCost | UnreachablePrecisionError | null): c is ResolventCost => c !== null && !(c instanceof UnreachablePrecisionError);
  const toffoli = { pauli: usable(pauli) ? countToffoli(pauli.encoding) : null, arithmetic: usable(arithmetic) && arithmetic.report.bEncoding?.used === 'arithmetic' ? countToffoli(arithmetic.encoding) : null };
  // Sampling needs shots ∝ α² (the Hadamard test reads G/α), so the whole readout costs ∝ Toffolis per application × α².
  const total = (count: number | null, cost: ResolventCost | UnreachablePrecisionError | null): number =>
    count === null || !usable(cost) ? Number.POSITIVE_INFINITY : count * cost.report.alphas.total ** 2;
  const pick = total(toffoli.arithmetic, arithmetic) < total(toffoli.pauli, pauli) ? arithmetic : pauli;
  if (!usable(pick)) throw pauli;
  return { ...pick, report: { ...pick.report, bEncoding: { ...pick.report.bEncoding!, toffoli } } };
}

function costWith(model: FermionModel, w: ComplexScalar, options: ResolventOptions): ResolventCost {
  const plan = planResolvent(model, w, options, 'resolventCost');
  const { M, F } = plan;
  const K = plan.conditionBound;
  const degree = inverseDegreeBound(plan.delta, relativeInverseError(plan.delta, plan.polynomialError));
  if (!Number.isSafeInteger(degree)) {
    throw new UnreachablePrecisionError(`resolventCost: δ = ${plan.delta.toExponential(3)} is too small: the polynomial's degree bound (${degree}) is not a representable count`, null);
  }
  const alphaInverse = 1 / ((options.supTarget ?? 0.5) * plan.delta * M.alpha);
  const inputPropagation = M.errorBound * M.alpha * K;
  const inverseError = plan.polynomialError + inputPropagation;
  const eF = F?.errorBound ?? 0;
  const errorBound = F ? eF + (1 + eF) * inverseError : inverseError;
  const inverse = qsvtInverseStructure(M, { degree, alpha: alphaInverse, errorBound: inverseError, label: `(${M.label})^-1` });
  const whole = F ? productEncoding([inverse, F]) : inverse;
  const total = whole.alpha;
  const report: ResolventReport = {
    route: options.route,
    w,
    window: plan.window,
    precision: plan.precision,
    requestedPrecision: options.precision,
    split: plan.split,
    conditionBound: K,
    conditionSource: plan.conditionSource,
    aPrioriConditionBound: plan.aPrioriConditionBound,
    bShift: plan.shift,
    bEncoding: plan.bEncoding,
    normBoundM: plan.normBoundM,
    normBoundB: plan.B?.alpha ?? null,
    alphas: { fastInverse: F?.alpha ?? null, B: plan.B?.alpha ?? null, M: M.alpha, inverse: alphaInverse, total },
    delta: plan.delta,
    scale: null,
    degree,
    degreeSource: 'truncation bound',
    queries: { M: degree, fastInverse: F ? degree + 1 : 0, B: plan.B ? degree : 0, H: plan.H ? degree : 0 },
    errorParts: { polynomial: plan.polynomialError, phases: 0, inputPropagation, fastInverse: eF },
    errorBound,
    errorBoundOperator: errorBound * total,
    qubits: { system: whole.systemQubits, ancilla: ancillaQubits(whole), total: whole.block.qubits },
    fastInverseBits: F?.registerBits ?? null,
    estimated: true,
  };
  return { report, encoding: { ...whole, label: options.label ?? `(w - H)^-1, ${options.route} (cost structure)`, errorBound } };
}
