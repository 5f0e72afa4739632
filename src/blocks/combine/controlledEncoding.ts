/**
 * controlledEncoding: the controlled version of an encoding. A control qubit joins the system register
 * as its top qubit (index n); the encoded operator is |0><0| ⊗ αI + |1><1| ⊗ M, with the same α, ancillas and error
 * bound (the projected block is |0><0| ⊗ I + |1><1| ⊗ Ũ, so its error is that of Ũ).
 */
import { defineBlock } from '../../circuit/defineBlock.js';
import { call } from '../../circuit/ops.js';
import { ancillaQubits, memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';
import { identityMatrix } from '../../linalg/identityMatrix.js';
import { kronMatrices } from '../../linalg/kronMatrices.js';
import { weightedSum } from '../../linalg/weightedSum.js';
import { zeroMatrix } from '../../linalg/zeroMatrix.js';

function projector(bit: 0 | 1) {
  const p = zeroMatrix(2);
  p.re[bit * 3] = 1;
  return p;
}

export function controlledEncoding(encoding: BlockEncoding, label = `controlled ${encoding.label}`): BlockEncoding {
  const n = encoding.systemQubits;
  const a = ancillaQubits(encoding);
  const inner = [...Array.from({ length: n }, (_, k) => k), ...Array.from({ length: a }, (_, k) => n + 1 + k)];
  return {
    label,
    systemQubits: n + 1,
    ancillas: encoding.ancillas,
    alpha: encoding.alpha,
    costNotes: encoding.costNotes,
    errorBound: encoding.errorBound,
    block: defineBlock({ name: 'controlled', role: `block-encoding of ${label}`, qubits: n + 1 + a }, [
      call(encoding.block, inner, [], { controls: [n] }),
    ]),
    exact: memoiseMatrix(() => {
      const dim = 2 ** n;
      return weightedSum(
        [
          { weight: { re: encoding.alpha, im: 0 }, matrix: kronMatrices(projector(0), identityMatrix(dim)) },
          { weight: { re: 1, im: 0 }, matrix: kronMatrices(projector(1), encoding.exact()) },
        ],
        2 * dim,
      );
    }),
  };
}
