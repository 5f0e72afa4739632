/**
 * ladderEncoding: a_j or a_j† under Jordan–Wigner as a two-term LCU on one ancilla, α = 1:
 * a_j = ½ Z_<j X_j + ½ Z_<j (iY_j) with iY = Z·X, so SELECT is X_j then a CZ from the ancilla
 * (a_j† = ½ Z_<j X_j + ½ Z_<j (−iY_j), −iY = X·Z: the CZ first). PREPARE is one Hadamard.
 */
import { defineConjugatedBlock } from '../../circuit/defineBlock.js';
import { gate } from '../../circuit/ops.js';
import type { GateOp } from '../../circuit/types.js';
import { ladderSumMatrix } from '../../operators/ladderSumMatrix.js';
import { ladder } from '../../operators/ladder.js';
import { memoiseMatrix, type BlockEncoding } from '../BlockEncoding.js';

export function ladderEncoding(mode: number, dagger: boolean, modes: number): BlockEncoding {
  if (!Number.isInteger(mode) || mode < 0 || mode >= modes) throw new RangeError(`ladderEncoding: mode ${mode} out of range`);
  const ancilla = modes;
  const string: GateOp[] = Array.from({ length: mode }, (_, q) => gate('z', [q]));
  const flip = gate('x', [mode]);
  const phase = gate('cz', [ancilla, mode]);
  const select = [...string, ...(dagger ? [phase, flip] : [flip, phase])];
  const label = dagger ? `creation ${mode}` : `annihilation ${mode}`;
  return {
    label,
    block: defineConjugatedBlock(
      { name: dagger ? `creation_${mode}` : `annihilation_${mode}`, role: `Jordan–Wigner ${dagger ? 'a†' : 'a'}_${mode}`, qubits: modes + 1 },
      [gate('h', [ancilla])],
      select,
    ),
    systemQubits: modes,
    ancillas: [{ name: 'ladder', size: 1, role: 'signal' }],
    alpha: 1,
    exact: memoiseMatrix(() => ladderSumMatrix(ladder(mode, dagger), modes)),
    costNotes: [],
    errorBound: 0,
  };
}
