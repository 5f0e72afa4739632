/**
 * qsvtEncoding: the quantum singular value transformation of any block-encoding (Hermitian or not) by a real polynomial p
 * of definite parity given by its Wx-convention QSP phases, as a plain BlockEncoding of p^{(SV)}(M/α) with α = 1
 * (Gilyén, Su, Low & Wiebe, STOC 2019, Thm. 17 and Cor. 18; Martyn, Rossi, Tan & Chuang, PRX Quantum 2, 040203, 2021).
 */
import { memoiseMatrix, type AncillaRegister, type BlockEncoding } from '../blocks/BlockEncoding.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import { qsvtCircuit } from './internal/qsvtCircuit.js';
import { singularValueFunction } from '../linalg/singularValueFunction.js';
import { reflectionPhases } from './reflectionPhases.js';

export interface QsvtOptions {
  /** φ_0 … φ_d in the Wx convention (qspPhases); the degree d = length − 1 ≥ 1 fixes the parity. */
  readonly phases: Float64Array;
  /** The real polynomial p the phases realise, Re⟨0|U_W(x)|0⟩ ≈ p(x); `exact()` applies it to the singular values. */
  readonly transform: (x: number) => number;
  /**
   * Measured max |Re⟨0|U_W(x)|0⟩ − p(x)| on 2(d+1) first-kind Chebyshev points (QspPhases.residual); default 0. The
   * difference is a polynomial of degree d, so its sup on [−1, 1] is at most the Lebesgue constant of those points
   * times the measured value (phaseErrorBound).
   */
  readonly phaseResidual?: number;
  /**
   * Bound on ‖p^{(SV)}(Ã) − p^{(SV)}(A)‖ given ‖Ã − A‖ ≤ e, for |p| ≤ 1. Default 4d√e, the general robustness bound of
   * Gilyén, Su, Low & Wiebe (arXiv:1806.01838, Lemma 22; from memory); callers with a sharper problem-specific bound
   * (e.g. qsvtInverse) pass it.
   */
  readonly inputErrorPropagation?: (inputError: number) => number;
  /** Repeat only U's action when U's compute part leaves the signal qubits alone (default true). */
  readonly actionOnly?: boolean;
  readonly label?: string;
}

export interface QsvtEncoding extends BlockEncoding {
  /** The encoding whose block the sequence calls as U (and inverted, as U†). */
  readonly queried: BlockEncoding;
  readonly degree: number;
  readonly parity: 'even' | 'odd';
  /** Calls of U and of U† in the sequence: ⌈d/2⌉ and ⌊d/2⌋. */
  readonly queries: { readonly forward: number; readonly adjoint: number };
  /** The reflection-convention phases ψ_0 … ψ_d the circuit uses (ψ_d first). */
  readonly reflectionPhases: Float64Array;
  /** Rigorous bound on sup |Re⟨0|U_W|0⟩ − p| on [−1, 1] from the measured residual (Lebesgue constant). */
  readonly phaseErrorBound: number;
  /** The input encoding's error carried through the transform. */
  readonly propagatedInputError: number;
  readonly actionOnly: boolean;
}

/** Rivlin's bound on the Lebesgue constant of N first-kind Chebyshev points: (2/π) ln N + 1 (Rivlin, Chebyshev Polynomials, 1990, Thm. 1.2; from memory). */
function chebyshevLebesgueBound(points: number): number {
  return (2 / Math.PI) * Math.log(points) + 1;
}

/**
 * @throws RangeError for fewer than two phases or non-finite phases.
 */
export function qsvtEncoding(encoding: BlockEncoding, options: QsvtOptions): QsvtEncoding {
  const phases = options.phases;
  if (phases.some((p) => !Number.isFinite(p))) throw new RangeError('qsvtEncoding: phases must be finite');
  const psi = reflectionPhases(phases);
  const d = phases.length - 1;
  const parity = d % 2 === 1 ? 'odd' : 'even';
  const label = options.label ?? `p(${encoding.label})`;
  const circuit = qsvtCircuit(encoding, psi, options.actionOnly ?? true, encoding.label);
  const residual = options.phaseResidual ?? 0;
  if (!(residual >= 0)) throw new RangeError(`qsvtEncoding: phaseResidual ${residual} is not ≥ 0`);
  const phaseErrorBound = residual * chebyshevLebesgueBound(2 * (d + 1));
  const propagate = options.inputErrorPropagation ?? ((e: number) => (e === 0 ? 0 : 4 * d * Math.sqrt(e)));
  const propagatedInputError = propagate(encoding.errorBound);
  const ancillas: AncillaRegister[] = [...encoding.ancillas, { name: 'qsvt_signal', size: 1, role: 'signal' }];
  const exact = (): ComplexMatrix => {
    const M = encoding.exact();
    const scaled = { n: M.n, re: M.re.map((x) => x / encoding.alpha), im: M.im.map((x) => x / encoding.alpha) };
    return singularValueFunction(scaled, options.transform, parity);
  };
  return {
    label,
    block: circuit.block,
    systemQubits: encoding.systemQubits,
    ancillas,
    alpha: 1,
    exact: memoiseMatrix(exact),
    costNotes: encoding.costNotes.map((note) => ({ ...note, label: `${note.label} (×${d} queries)`, toffoli: note.toffoli * d })),
    errorBound: phaseErrorBound + propagatedInputError,
    queried: encoding,
    degree: d,
    parity,
    queries: { forward: Math.ceil(d / 2), adjoint: Math.floor(d / 2) },
    reflectionPhases: psi,
    phaseErrorBound,
    propagatedInputError,
    actionOnly: circuit.actionOnly,
  };
}
