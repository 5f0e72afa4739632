/**
 * qsvtSequence: the circuit shape of a degree-d QSVT of an encoding U, built for counting only (the phases are symbolic
 * parameters, so every signal rotation counts as an arbitrary rotation; no phases are computed): d + 1 projector-
 * controlled phase rotations (C^s X onto one extra signal qubit, rz, C^s X, with s = U's signal ancillas) around
 * ⌈d/2⌉ calls of U and ⌊d/2⌋ of U† (Gilyén, Su, Low & Wiebe, STOC 2019, Fig. 1 / Cor. 8). The alternating pairs are
 * one block called ⌊d/2⌋ times, so any degree costs nothing to build.
 */
import { param } from '../../circuit/angle.js';
import { defineBlock } from '../../circuit/defineBlock.js';
import { call, gate } from '../../circuit/ops.js';
import type { UnitaryOp } from '../../circuit/types.js';
import { ancillaIndicesWithRole, type BlockEncoding } from '../../blocks/BlockEncoding.js';

/** A cost-only BlockEncoding of p(M/α)·scale⁻¹… with the given α and error bound; `exact()` is not available. */
export function qsvtSequence(encoding: BlockEncoding, degree: number, alpha: number, errorBound: number, label: string): BlockEncoding {
  if (!Number.isSafeInteger(degree) || degree < 1) throw new RangeError(`qsvtSequence: degree ${degree} is not a positive integer`);
  const width = encoding.block.qubits;
  const signals = ancillaIndicesWithRole(encoding, 'signal');
  const flag = width;
  const reflection = defineBlock(
    { name: 'qsvt_reflection', role: 'projector-controlled phase rotation of the QSVT sequence', qubits: width + 1, params: ['phi'] },
    [gate('x', [flag], [], { negControls: signals }), gate('rz', [flag], [param(0)]), gate('x', [flag], [], { negControls: signals })],
  );
  const all = Array.from({ length: width + 1 }, (_, k) => k);
  const local = all.slice(0, width);
  const reflect = (index: number): UnitaryOp => call(reflection, all, [index]);
  const pair = defineBlock({ name: 'qsvt_pair', role: 'U, reflection, U adjoint, reflection', qubits: width + 1, params: ['a', 'b'] }, [
    call(encoding.block, local),
    call(reflection, all, [param(0)]),
    call(encoding.block, local, [], { inverse: true }),
    call(reflection, all, [param(1)]),
  ]);
  const ops: UnitaryOp[] = [reflect(0.1), call(pair, all, [0.2, 0.3], { power: Math.floor(degree / 2) })];
  if (degree % 2 === 1) ops.push(call(encoding.block, local), reflect(0.4));
  return {
    label,
    block: defineBlock({ name: 'qsvt_sequence', role: `degree-${degree} QSVT sequence of ${encoding.label} (cost model)`, qubits: width + 1 }, ops),
    systemQubits: encoding.systemQubits,
    ancillas: [...encoding.ancillas.map((a) => ({ ...a, role: 'signal' as const })), { name: 'qsvt_signal', size: 1, role: 'signal' }],
    alpha,
    exact: () => {
      throw new RangeError('qsvtSequence: a cost-only sequence has no exact operator');
    },
    costNotes: [],
    errorBound,
  };
}
