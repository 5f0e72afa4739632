/**
 * qubitizedResolventRow: the check row of a resolvent encoding whose whole sequence is too costly to simulate column by
 * column (d calls of the queried block per column). The QSVT inverse is evaluated by qubitizedColumns (its queried block
 * simulated gate by gate on the sector's columns, forwards and inverted), the preconditioned route's fast inverse is
 * simulated on the same columns, and their product on the sector is compared with the reference. The entry error reported
 * includes the allowance for what the blocks leak out of the sector or into set clean ancillas.
 */
import type { ResolventEncoding } from '../resolvent/resolventEncoding.js';
import { matrixMultiply } from '../linalg/matrixMultiply.js';
import { MAX_SIMULATION_WORK, simulationWork, type CheckLimits } from './checkModelBlocks.js';
import { judgedRow, skippedRow, type CheckRow } from './encodingCheck.js';
import { qsvtSubspaceBlock, subspaceColumns } from './qubitizedColumns.js';
import { referenceColumn, type ReferenceOperator } from './verifyEncoding.js';

/**
 * @param whyNotWhole why the whole sequence was not simulated (stated when this row is skipped as well).
 */
export function qubitizedResolventRow(encoding: ResolventEncoding, reference: () => ReferenceOperator, states: readonly number[], thresholds: CheckLimits, whyNotWhole: string): CheckRow {
  const simulation = thresholds.simulation ?? {};
  const { inverse, fastInverse } = encoding.parts;
  const m = states.length;
  const query = simulationWork(inverse.qsvt.queried, 2 * m, simulation);
  const factor = fastInverse ? simulationWork(fastInverse, m, simulation) : { work: 0, tooWide: false, stateQubits: 0 };
  const limit = thresholds.maxSimulationWork ?? MAX_SIMULATION_WORK;
  if (query.tooWide || factor.tooWide) {
    return skippedRow(encoding, `${whyNotWhole}; the queried block keeps ${Math.max(query.stateQubits, factor.stateQubits)} qubits, beyond the simulation limit`);
  }
  const work = query.work + factor.work;
  if (work > limit) {
    return skippedRow(encoding, `${whyNotWhole}; the qubitized check needs ${work.toExponential(1)}, also beyond the limit`);
  }
  const sequence = qsvtSubspaceBlock(inverse.qsvt, states, simulation);
  const F = fastInverse ? subspaceColumns(fastInverse, states, simulation) : null;
  const block = F ? matrixMultiply(sequence.block, F.block) : sequence.block;
  // ‖P_seq F − B_seq B_F‖ ≤ allowance_seq·‖F‖ + ‖B_seq‖·allowance_F, both norms ≤ 1 (blocks of unitaries).
  const allowance = sequence.allowance + (F?.allowance ?? 0);
  const operator = reference();
  const scale = 1 / encoding.alpha;
  let entryError = 0;
  states.forEach((x, c) => {
    const expected = referenceColumn(operator, x);
    states.forEach((y, r) => {
      const dr = block.re[r * m + c]! - expected.re[y]! * scale;
      const di = block.im[r * m + c]! - expected.im[y]! * scale;
      entryError = Math.max(entryError, Math.hypot(dr, di));
    });
  });
  const unitarityDeviation = Math.max(sequence.normDeviation, F?.normDeviation ?? 0);
  return judgedRow(encoding, { maxError: entryError + allowance, unitarityDeviation, method: 'qubitized' }, thresholds);
}
