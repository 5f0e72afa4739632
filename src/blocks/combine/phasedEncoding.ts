/**
 * phasedEncoding: e^{iφ} M from an encoding of M (a global phase inside the block, which becomes a
 * relative phase when the block is controlled). Same α, ancillas and error bound (a unit scalar keeps the norm).
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call, gate } from '../../circuit/ops.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { weightedSum } from '../../linalg/weightedSum.js';

export function phasedEncoding(encoding: BlockEncoding, phase: number, label = `e^{i${phase}} ${encoding.label}`): BlockEncoding {
  const width = encoding.block.qubits;
  return {
    label,
    systemQubits: encoding.systemQubits,
    ancillas: encoding.ancillas,
    alpha: encoding.alpha,
    costNotes: encoding.costNotes,
    errorBound: encoding.errorBound,
    block: defineBlock({ name: 'phased', role: `block-encoding of ${label}`, qubits: width }, [
      call(encoding.block, Array.from({ length: width }, (_, k) => k)),
      gate('gphase', [], [phase]),
    ]),
    exact: memoiseMatrix(() =>
      weightedSum([{ weight: { re: Math.cos(phase), im: Math.sin(phase) }, matrix: encoding.exact() }], 2 ** encoding.systemQubits),
    ),
  };
}
