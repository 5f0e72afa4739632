/**
 * qsvtCircuit: the circuit blocks of a real-part QSVT sequence (Gilyén, Su, Low & Wiebe, STOC 2019, Thm. 17 / Fig. 1 and
 * Cor. 18; Martyn, Rossi, Tan & Chuang, PRX Quantum 2, 040203, 2021, Sec. IV): one extra qubit q in |+> selects the phase
 * sequence ψ (q = 0) or −ψ (q = 1), so projecting q back on |+> gives ½(U_ψ + U_{−ψ}), the real part of the polynomial.
 * The projector-controlled phase e^{±iψ(2Π−I)} about the signal projector Π (all signal qubits |0>) is a
 * multi-controlled X from the signal qubits onto q, rz(2ψ) on q, and the same X again: q ends as it started.
 *
 * Hierarchy (nothing copied): `qsvt_phase(theta)` is the reflection; `qsvt_step(theta_a, theta_b)` is one U, a phase,
 * one U† and a phase; the sequence calls the step ⌊d/2⌋ times with its own angles, plus one U and a phase when d is odd.
 * The placeholder form (placeholderQsvtCircuit, for counting) gives every phase one angle, so its ⌊d/2⌋ steps are one
 * call with power ⌊d/2⌋ and any degree takes constant memory.
 * When U is in compute/action form and its compute touches no signal qubit, the compute commutes with every reflection,
 * so U = C⁻¹·Act·C gives U_Φ = C⁻¹·(the sequence of Act and Act†)·C: the action-only form computes once.
 */
import { param } from '../../circuit/angle.js';
import { defineBlock, defineConjugatedBlock } from '../../circuit/defineBlock.js';
import { call, gate } from '../../circuit/ops.js';
import type { Block, UnitaryOp } from '../../circuit/types.js';
import { ancillaIndicesWithRole, ancillaQubits, type BlockEncoding } from '../../blocks/BlockEncoding.js';

export interface QsvtCircuit {
  readonly block: Block;
  /** Whether the sequence repeats only U's action, with U's compute done once around it. */
  readonly actionOnly: boolean;
}

/** Every qubit an op list touches (operands and controls; a call counts all its operands). */
function touchedQubits(ops: readonly UnitaryOp[]): Set<number> {
  const touched = new Set<number>();
  for (const op of ops) for (const q of [...op.qubits, ...op.controls, ...op.negControls]) touched.add(q);
  return touched;
}

/** The action and compute blocks of U when its compute part leaves the signal qubits alone, else null. */
function splitConjugated(encoding: BlockEncoding): { compute: Block; action: Block } | null {
  const body = encoding.block.body;
  if (body.kind !== 'conjugated') return null;
  const signal = ancillaIndicesWithRole(encoding, 'signal');
  const touched = touchedQubits(body.compute);
  if (signal.some((q) => touched.has(q))) return null;
  const qubits = encoding.block.qubits;
  return {
    compute: defineBlock({ name: 'qsvt_query_compute', role: `compute part of ${encoding.label}`, qubits }, body.compute),
    action: defineBlock({ name: 'qsvt_query_action', role: `action part of ${encoding.label}`, qubits }, body.action),
  };
}

/** The rz angles of a sequence: the first phase, the steps' angle pairs (each repeated `times`), the last phase (odd d). */
interface SequenceAngles {
  readonly degree: number;
  readonly first: number;
  readonly steps: readonly { readonly a: number; readonly b: number; readonly times: number }[];
  readonly last: number | null;
}

/**
 * @param psi reflection-convention phases ψ_0 … ψ_d (reflectionPhases); the one applied first is ψ_d.
 * @param actionOnly use the action-only form when U allows it.
 */
export function qsvtCircuit(encoding: BlockEncoding, psi: Float64Array, actionOnly: boolean, label: string): QsvtCircuit {
  const d = psi.length - 1;
  const steps: { a: number; b: number; times: number }[] = [];
  for (let k = d - 1; k >= 1; k -= 2) steps.push({ a: 2 * psi[k]!, b: 2 * psi[k - 1]!, times: 1 });
  return sequenceCircuit(encoding, { degree: d, first: 2 * psi[d]!, steps, last: d % 2 === 1 ? 2 * psi[0]! : null }, actionOnly, label);
}

/**
 * The circuit of qsvtCircuit for degree d with every rz angle equal to `angle`: the same blocks, qubits and calls, for
 * counting resources of a degree whose phases are not computed.
 */
export function placeholderQsvtCircuit(encoding: BlockEncoding, degree: number, angle: number, actionOnly: boolean, label: string): QsvtCircuit {
  const pairs = Math.floor(degree / 2);
  const steps = pairs > 0 ? [{ a: angle, b: angle, times: pairs }] : [];
  return sequenceCircuit(encoding, { degree, first: angle, steps, last: degree % 2 === 1 ? angle : null }, actionOnly, label);
}

function sequenceCircuit(encoding: BlockEncoding, angles: SequenceAngles, actionOnly: boolean, label: string): QsvtCircuit {
  const d = angles.degree;
  const width = encoding.systemQubits + ancillaQubits(encoding);
  const q = width;
  const signal = ancillaIndicesWithRole(encoding, 'signal');
  const inner = Array.from({ length: width }, (_, k) => k);
  const phaseBlock = defineBlock(
    { name: 'qsvt_phase', role: 'signal-projector-controlled phase e^{i theta/2 (2Pi - I)}, sign set by the QSVT qubit', qubits: signal.length + 1, params: ['theta'] },
    (() => {
      const target = signal.length;
      const toggle = gate('x', [target], [], { negControls: signal.map((_, k) => k) });
      return [toggle, gate('rz', [target], [param(0)]), toggle];
    })(),
  );
  const split = actionOnly ? splitConjugated(encoding) : null;
  const query = split ? split.action : encoding.block;
  const phaseQubits = [...signal, q];
  const step = defineBlock(
    { name: 'qsvt_step', role: `one U, phase, U-dagger, phase step of the QSVT of ${encoding.label}`, qubits: width + 1, params: ['theta_a', 'theta_b'] },
    [
      call(query, inner),
      call(phaseBlock, phaseQubits, [param(0)]),
      call(query, inner, [], { inverse: true }),
      call(phaseBlock, phaseQubits, [param(1)]),
    ],
  );
  const sequence: UnitaryOp[] = [call(phaseBlock, phaseQubits, [angles.first])];
  const stepQubits = [...inner, q];
  for (const { a, b, times } of angles.steps) sequence.push(call(step, stepQubits, [a, b], times === 1 ? {} : { power: times }));
  if (angles.last !== null) sequence.push(call(query, inner), call(phaseBlock, phaseQubits, [angles.last]));
  const compute: UnitaryOp[] = [gate('h', [q])];
  if (split) compute.push(call(split.compute, inner));
  const block = defineConjugatedBlock(
    { name: 'qsvt', role: `real-part QSVT of degree ${d} of ${label}`, qubits: width + 1 },
    compute,
    sequence,
  );
  return { block, actionOnly: split !== null };
}
