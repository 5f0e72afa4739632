/**
 * planResolvent: everything of an inverse block-encoding of (w − H)⁻¹ except the polynomial: the encoding M to invert,
 * its condition bound K, the split of the precision ε and the polynomial's share.
 *
 * Preconditioned (w − H = (w − A)(I − (w − A)⁻¹B)): F = fastInverse (w − A)⁻¹, M = I − F·B as the linear combination of
 * the identity and productEncoding([F, B]) (α_M = 1 + α_F α_B), K = 1 + α_B/|Im w| ≥ 1 + ‖B‖/|Im w| ≥ ‖M⁻¹‖ since
 * M⁻¹ = I + (w − H)⁻¹B and ‖(w − H)⁻¹‖ ≤ 1/|Im w| (on the whole Fock space and on any electron window), ‖M‖ ≤ 1 + ‖F‖‖B‖
 * ≤ 1 + α_B/|Im w|. Split: half of ε for the quantisation — F's error e_F and its effect through the inverse,
 * e_F + (1 + e_F) s e_M α_M K/δ with e_M = (α_F α_B/α_M) e_F and s < δ, α_F ≤ 1/|Im w|, so F is built with precision
 * (ε/2)/(1 + 2 K α_B/|Im w|) — and what remains, (ε − e_F)/(1 + e_F) − e_M α_M K, for the polynomial (99 %; 1 % for the
 * phase residual).
 * B's identity part is moved into the shift first (B = b₀I + B', w − H = (w − b₀) − A − B'; Babbush et al., Phys. Rev. X 8,
 * 041015, 2018, drop the identity term of an LCU the same way): F is the fast inverse at w − b₀ and M = I − F·B', which
 * lowers α_B, hence K and α_M, by |b₀|; `B` below is B'.
 * B' is the Pauli LCU (α_B' = its 1-norm) or, with `bEncoding: 'arithmetic'` and a B diagonal in the occupation basis,
 * diagonalEncoding (α_B' = β ≥ max|B(x) − b₀| on the window, b₀ then the centre of B's range, not its identity
 * coefficient); K = 1 + α_B'/|Im w| holds for both since α_B' ≥ ‖B'‖ (on the window: with a window both F and B' are
 * P … P, and M = I outside it). The arithmetic B' has its own error e_B (its coefficients' rounding); it enters M's error
 * as F's does, so it gets the same precision (ε/2)/(1 + 2 K α_B/|Im w|) and M's measured error is what is propagated.
 * Direct: M = w − H as directShift builds it (α = |w| + α_H, exact), K = 1/|Im w|, all of ε (99 %) for the polynomial.
 * When the fast inverse, at its register cap, leaves nothing of ε for the polynomial, the plan throws — or, with
 * `reachablePrecision`, plans for the smallest precision it allows instead, 2(e_F + (1 + e_F) e_M α_M K) (half for the
 * polynomial), and says so (`precision` ≠ `requestedPrecision`). When e_M ≥ 1/(α_M K) no precision is reachable:
 * UnreachablePrecisionError either way.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { identityEncoding } from '../blocks/combine/identityEncoding.js';
import { linearCombination } from '../blocks/combine/linearCombination.js';
import { productEncoding } from '../blocks/combine/productEncoding.js';
import { shiftedEncoding } from '../blocks/combine/shiftedEncoding.js';
import { pauliLcu } from '../blocks/builders/pauliLcu.js';
import { fastInverse, type FastInverseEncoding, type FastInverseOptions } from '../inversion/fastInverse.js';
import { diagonalBound } from '../inversion/diagonalBound.js';
import { diagonalEncoding } from '../inversion/diagonalEncoding.js';
import type { ComplexScalar } from '../linalg/ComplexScalar.js';
import type { FermionModel } from '../model/FermionModel.js';
import { jordanWigner } from '../operators/jordanWigner.js';
import { modelHamiltonian } from '../operators/modelHamiltonian.js';
import { simplifyPauli } from '../operators/simplifyPauli.js';
import { inverseDelta } from '../qsvt/qsvtInverse.js';
import { oneBodyA } from './internal/oneBodyA.js';
import type { BEncodingReport, ResolventRoute } from './ResolventReport.js';
import { UnreachablePrecisionError } from './UnreachablePrecisionError.js';

export interface ResolventOptions {
  readonly route: ResolventRoute;
  /** ε in (0, 1): the target for the rigorous bound on the encoded operator, in projected-block units. */
  readonly precision: number;
  /**
   * Preconditioned route: electron-number window N or [Nmin, Nmax] of the fast inverse, so the encoding is
   * P (w − H)⁻¹ P (costs an electron counter and a window qubit). Default: none — the whole Fock space, fewer qubits;
   * the condition bound holds there too, and the Green's-function sector's columns are the same. Ignored by the direct
   * route, which always encodes the whole Fock space.
   */
  readonly electrons?: number | readonly [number, number];
  /**
   * Preconditioned route: how B' is block-encoded — 'pauli' (default: the Pauli LCU) or 'arithmetic' (diagonalEncoding,
   * when B is diagonal in the occupation basis; otherwise the Pauli LCU, and the report says why).
   */
  readonly bEncoding?: 'pauli' | 'arithmetic';
  /** Passed to fastInverse (precision, window and label are set here); its adder is the arithmetic B's too. */
  readonly fastInverse?: Omit<FastInverseOptions, 'precision' | 'electrons' | 'label'>;
  /** sup |p| of the inverse polynomial (default 0.5). */
  readonly supTarget?: number;
  /** Cap on the polynomial degree (default MAX_INVERSE_DEGREE = 20,000). */
  readonly maxDegree?: number;
  /**
   * When the capped fast inverse cannot meet ε, plan for the smallest precision it allows instead of throwing (for
   * costing; the report states both). Default false.
   */
  readonly reachablePrecision?: boolean;
  /**
   * A caller's rigorous K ≥ ‖M⁻¹‖, used when it is below the a-priori bound (the report says which): for the preconditioned
   * route ‖(w − H)⁻¹ (w − b₀ − A)‖ on the electron window (M⁻¹ = (w − H)⁻¹(w − b₀ − A); requires `electrons`, so that M = I
   * outside it), for the direct route ‖(w − H)⁻¹‖ on the whole Fock space. Small models can compute it exactly.
   */
  readonly conditionBound?: number;
  readonly label?: string;
}

export interface ResolventPlan {
  /** b₀: the identity part of B moved into the shift (preconditioned route; 0 for the direct route). */
  readonly shift: number;
  /** 'a priori': 1 + ‖B'‖/|Im w| with ‖B'‖ ≤ α_B' (preconditioned) or 1/|Im w| (direct); 'given': options.conditionBound. */
  readonly conditionSource: 'a priori' | 'given';
  /** The a-priori K, reported beside a given one. */
  readonly aPrioriConditionBound: number;
  readonly M: BlockEncoding;
  readonly F: FastInverseEncoding | null;
  readonly B: BlockEncoding | null;
  readonly H: BlockEncoding | null;
  readonly conditionBound: number;
  readonly normBoundM: number;
  readonly delta: number;
  /** The ε planned for: the requested one, or the reachable one (`reachablePrecision`). */
  readonly precision: number;
  readonly split: { readonly polynomial: number; readonly quantisation: number };
  /** Target for max |p(x) − s/x| on [δ, 1]. */
  readonly polynomialError: number;
  readonly window: { readonly min: number; readonly max: number } | null;
  /** Preconditioned route: which encoding B' got and both α's; null on the direct route. */
  readonly bEncoding: BEncodingReport | null;
}

const POLYNOMIAL_SHARE = 0.99;
/** Smallest ε planned for: QSP phases reach residuals of ~1e-14 and the polynomial's certified error ~1e-12. */
export const MIN_PRECISION = 1e-10;

/**
 * The model's Pauli-LCU encoding of H (the direct route's; modelEncodings builds it the same way) per model: it does not
 * depend on w or ε, so repeated plans build it once, and A's and B's LCUs, which no plan uses, are not built.
 */
const hamiltonianPerModel = new WeakMap<FermionModel, BlockEncoding>();

function hamiltonianOf(model: FermionModel): BlockEncoding {
  let encoding = hamiltonianPerModel.get(model);
  if (!encoding) hamiltonianPerModel.set(model, (encoding = pauliLcu(jordanWigner(modelHamiltonian(model, { part: 'all' }), model.modes), 'H')));
  return encoding;
}

/** B without its identity part: the encoding of B' = B − b₀I and the shift b₀ (real, B being Hermitian). */
interface ShiftedB {
  readonly encoding: BlockEncoding;
  readonly shift: number;
}

const shiftedBPerModel = new WeakMap<FermionModel, ShiftedB>();

/** b₀, the identity coefficient of the model's B that the preconditioned route moves into the shift. */
export function identityShiftOfB(model: FermionModel): number {
  return shiftedBOf(model).shift;
}

function shiftedBOf(model: FermionModel): ShiftedB {
  let shifted = shiftedBPerModel.get(model);
  if (!shifted) {
    const sum = simplifyPauli(jordanWigner(modelHamiltonian(model, { part: 'B' }), model.modes));
    const identity = sum.terms.find((t) => t.x === 0n && t.z === 0n);
    const rest = { qubits: sum.qubits, terms: sum.terms.filter((t) => t !== identity) };
    shifted = { encoding: pauliLcu(rest, "B' (two-body, identity moved into w)"), shift: identity?.re ?? 0 };
    shiftedBPerModel.set(model, shifted);
  }
  return shifted;
}

function windowOf(electrons: ResolventOptions['electrons'], modes: number): { min: number; max: number } | null {
  if (electrons === undefined) return null;
  const [min, max] = typeof electrons === 'number' ? [electrons, electrons] : electrons;
  return min === 0 && max === modes ? null : { min, max };
}

/** K: the a-priori bound, or the caller's when it is valid and smaller. */
function conditionOf(aPriori: number, options: ResolventOptions, caller: string, windowed: boolean): { K: number; source: 'a priori' | 'given'; aPriori: number } {
  const given = options.conditionBound;
  if (given === undefined) return { K: aPriori, source: 'a priori', aPriori };
  if (!(Number.isFinite(given) && given >= 1)) throw new RangeError(`${caller}: conditionBound ${given} is not a finite number ≥ 1 (‖M⁻¹‖ ≥ 1 here)`);
  if (!windowed) throw new RangeError(`${caller}: a given conditionBound needs the electron window it was computed on (option electrons)`);
  return given < aPriori ? { K: given, source: 'given', aPriori } : { K: aPriori, source: 'a priori', aPriori };
}

/**
 * @throws RangeError naming the value for Im w = 0 (or non-finite w), ε outside (0, 1) or an unknown route;
 *   UnreachablePrecisionError (a RangeError) when the fast inverse's error leaves δ ≤ 0, or leaves nothing of ε for the
 *   polynomial (unless `reachablePrecision`).
 */
export function planResolvent(model: FermionModel, w: ComplexScalar, options: ResolventOptions, caller: string): ResolventPlan {
  const epsilon = options.precision;
  if (!Number.isFinite(w.re) || !Number.isFinite(w.im) || w.im === 0) {
    throw new RangeError(`${caller}: w = ${w.re}${w.im < 0 ? '' : '+'}${w.im}i must be finite with Im w ≠ 0`);
  }
  if (!(epsilon >= MIN_PRECISION && epsilon < 1)) {
    throw new RangeError(`${caller}: precision ε = ${epsilon} is not in [${MIN_PRECISION}, 1): phase factors and the measured polynomial error are certified to about 1e-12`);
  }
  const eta = Math.abs(w.im);
  if (options.route === 'direct') {
    // directShift's construction (w·I − H by shiftedEncoding) on the model's H built once.
    const M = shiftedEncoding(hamiltonianOf(model), w, 'w - H');
    const { K, source, aPriori } = conditionOf(1 / eta, options, caller, true);
    if (!(1 / (M.alpha * K) - M.errorBound > 0)) {
      // Only for absurd shifts (|w| near the double range): 1/(α_M K) underflows.
      throw new UnreachablePrecisionError(`${caller}: no precision is reachable on the direct route: δ = 1/(α_M K) − e_M ≤ 0 in double precision (α_M = ${M.alpha}, K = ${K})`, null);
    }
    return {
      shift: 0, conditionSource: source, aPrioriConditionBound: aPriori, M, F: null, B: null, H: M, conditionBound: K, normBoundM: M.alpha, delta: inverseDelta(M.alpha, K, M.errorBound), precision: epsilon,
      split: { polynomial: epsilon, quantisation: 0 }, polynomialError: POLYNOMIAL_SHARE * epsilon, window: null, bEncoding: null,
    };
  }
  if (options.route !== 'preconditioned') throw new RangeError(`${caller}: unknown route "${String(options.route)}"`);
  const pauli = shiftedBOf(model);
  const window = windowOf(options.electrons, model.modes);
  const windowRange = window ? ([window.min, window.max] as const) : undefined;
  const diagonal = diagonalBound(model, windowRange);
  const arithmetic = options.bEncoding === 'arithmetic' && !('notDiagonal' in diagonal) && diagonal.beta > 0;
  const alphaB = arithmetic ? diagonal.beta : pauli.encoding.alpha;
  const { K, source, aPriori } = conditionOf(1 + alphaB / eta, options, caller, window !== null);
  const quantisation = epsilon / 2;
  const factorPrecision = quantisation / (1 + (2 * K * alphaB) / eta);
  const built = arithmetic
    ? diagonalEncoding(model, { precision: factorPrecision, ...(windowRange ? { electrons: windowRange } : {}), ...(options.fastInverse?.adder ? { adder: options.fastInverse.adder } : {}), label: "B' (diagonal, arithmetic; b0 moved into w)" })
    : null;
  const { encoding: B, shift } = built && !('notDiagonal' in built) ? { encoding: built, shift: built.shift } : pauli;
  const bEncoding: BEncodingReport = {
    used: B === pauli.encoding ? 'pauli' : 'arithmetic',
    alphaPauli: pauli.encoding.alpha,
    alphaArithmetic: 'notDiagonal' in diagonal ? null : diagonal.beta,
    ...('notDiagonal' in diagonal ? { notDiagonal: diagonal.notDiagonal } : {}),
  };
  const F = fastInverse(oneBodyA(model), { re: w.re - shift, im: w.im }, {
    ...options.fastInverse,
    precision: factorPrecision,
    ...(window ? { electrons: [window.min, window.max] as const } : {}),
    label: '(w - A)^-1',
  });
  const FB = productEncoding([F, B], "(w - b0 - A)^-1 B'");
  const M = linearCombination([{ coefficient: { re: 1, im: 0 }, encoding: identityEncoding(model.modes) }, { coefficient: { re: -1, im: 0 }, encoding: FB }], "I - (w - b0 - A)^-1 B'");
  const eF = F.errorBound;
  const register = `${F.registerBits}-bit energy register${F.bitsCapped ? ', capped' : ''}`;
  if (!(1 / (M.alpha * K) - M.errorBound > 0)) {
    throw new UnreachablePrecisionError(
      `${caller}: no precision is reachable: the fast inverse's error bound ${eF.toExponential(3)} (${register}) makes M's error ${M.errorBound.toExponential(3)} reach 1/(α_M K): δ = 1/(α_M K) − e_M = ${(1 / (M.alpha * K) - M.errorBound).toExponential(3)} ≤ 0`,
      null,
    );
  }
  const propagated = M.errorBound * M.alpha * K;
  const share = (eps: number): number => POLYNOMIAL_SHARE * ((eps - eF) / (1 + eF) - propagated);
  let planned = epsilon;
  if (!(share(epsilon) > 0)) {
    const reachable = 2 * (eF + (1 + eF) * propagated);
    const message = `${caller}: precision ε = ${epsilon} cannot be met: the fast inverse's error bound ${eF} (${register}) leaves nothing for the polynomial`;
    if (!(reachable < 1)) throw new UnreachablePrecisionError(`${message}, nor at any ε < 1`, null);
    if (options.reachablePrecision !== true) throw new UnreachablePrecisionError(`${message}; ε = ${reachable.toExponential(3)} is reachable`, reachable);
    planned = reachable;
  }
  // Reachable precision: half for the quantisation (what F already costs), half for the polynomial.
  const quantisationShare = planned === epsilon ? quantisation : planned / 2;
  return {
    shift, conditionSource: source, aPrioriConditionBound: aPriori, M, F, B, H: null, conditionBound: K, normBoundM: 1 + B.alpha / eta, delta: inverseDelta(M.alpha, K, M.errorBound), precision: planned,
    split: { polynomial: planned - quantisationShare, quantisation: quantisationShare }, polynomialError: Math.min(share(planned), 0.5), window, bEncoding,
  };
}
