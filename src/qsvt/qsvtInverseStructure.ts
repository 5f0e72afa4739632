/**
 * qsvtInverseStructure: the circuit of qsvtInverse — the real-part QSVT sequence on the adjoint of the input encoding,
 * with the same blocks, qubits, ancilla registers and query calls — for a given degree, without computing the
 * polynomial or its phases, so resource counts of degrees far beyond what phase finding reaches cost nothing to build.
 * Every phase is one placeholder angle (PLACEHOLDER_PHASE: generic, far from any multiple of π/4, so a counter that
 * recognises Clifford angles counts each phase as the arbitrary rotation a real phase is). α and the error bound are the
 * caller's (e.g. the resolvent plan's rigorous bound); `exact()` throws, since the circuit encodes no operator.
 */
import type { BlockEncoding } from '../blocks/BlockEncoding.js';
import { adjointEncoding } from '../blocks/combine/adjointEncoding.js';
import { placeholderQsvtCircuit } from './internal/qsvtCircuit.js';

/** The rz angle of every placeholder phase (radians): not within 1e-9 of a multiple of π/4. */
export const PLACEHOLDER_PHASE = 1;

export interface QsvtInverseStructureOptions {
  /** Degree d ≥ 1 of the inverse polynomial (odd for 1/x). */
  readonly degree: number;
  /** α of the encoded M⁻¹, 1/(s α_M). */
  readonly alpha: number;
  /** Bound on ‖projected block − M⁻¹/α‖ the caller guarantees for the built circuit. */
  readonly errorBound: number;
  readonly actionOnly?: boolean;
  readonly label?: string;
}

export interface QsvtInverseStructure extends BlockEncoding {
  readonly degree: number;
  /** Calls of the input encoding's block and of its inverse, as qsvtInverse counts them. */
  readonly queries: { readonly forward: number; readonly adjoint: number };
}

/** @throws RangeError for a degree that is not a positive safe integer, or α / error bound that are not finite and ≥ 0. */
export function qsvtInverseStructure(encoding: BlockEncoding, options: QsvtInverseStructureOptions): QsvtInverseStructure {
  const { degree, alpha, errorBound } = options;
  if (!Number.isSafeInteger(degree) || degree < 1) throw new RangeError(`qsvtInverseStructure: degree ${degree} is not a positive integer`);
  if (!(alpha > 0 && Number.isFinite(alpha))) throw new RangeError(`qsvtInverseStructure: α = ${alpha} is not positive and finite`);
  if (!(errorBound >= 0 && Number.isFinite(errorBound))) throw new RangeError(`qsvtInverseStructure: error bound ${errorBound} is not finite and ≥ 0`);
  const adjoint = adjointEncoding(encoding);
  const label = options.label ?? `(${encoding.label})^-1`;
  const circuit = placeholderQsvtCircuit(adjoint, degree, PLACEHOLDER_PHASE, options.actionOnly ?? true, adjoint.label);
  // The sequence runs on the adjoint, so its forward calls (⌈d/2⌉) are calls of the input block inverted.
  return {
    label,
    block: circuit.block,
    systemQubits: encoding.systemQubits,
    ancillas: [...encoding.ancillas, { name: 'qsvt_signal', size: 1, role: 'signal' }],
    alpha,
    exact: () => {
      throw new RangeError(`qsvtInverseStructure: "${label}" is a counting structure with placeholder phases; it encodes no operator`);
    },
    costNotes: encoding.costNotes.map((note) => ({ ...note, label: `${note.label} (×${degree} queries)`, toffoli: note.toffoli * degree })),
    errorBound,
    degree,
    queries: { forward: Math.floor(degree / 2), adjoint: Math.ceil(degree / 2) },
  };
}

