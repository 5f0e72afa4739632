/**
 * temporaryAnd: with measurement-based uncomputation (the decomposition table's `measured` mode), costs a conjugated block
 * whose compute is one ccx onto a work qubit — the AND of two controls held while the action runs, as the pair terms of
 * the Fourier and ripple adders use it — as a temporary logical-AND: 1 Toffoli to compute (4 T), 0 to erase (an X-basis
 * measurement and a classically controlled CZ: Cliffords), instead of the simulated ccx pair's 2 Toffolis (Gidney,
 * Quantum 2, 74, 2018, §2: four T gates to store the logical-AND of two qubits, zero to erase it; equivalent to Jones,
 * Phys. Rev. A 87, 022328, 2013). The action is counted as simulated, under the application's modifiers and repeats.
 */
import type { Block } from '../../circuit/types.js';
import type { CostOverride } from '../CostOverride.js';
import { singleCharge, sumCounts } from '../HierarchyCount.js';
import { tally } from '../Tally.js';

export const TEMPORARY_AND_SOURCE = 'Gidney, Quantum 2, 74 (2018), temporary logical-AND erased by measurement';
const LABEL = 'temporary logical-AND (measured uncompute)';

/** The override for `block` when its compute is exactly one plain ccx whose target is a declared work qubit, else null. */
export function temporaryAnd(block: Block): CostOverride | null {
  const body = block.body;
  if (body.kind !== 'conjugated' || body.compute.length !== 1) return null;
  const and = body.compute[0]!;
  const plain = and.kind === 'gate' && and.name === 'ccx' && and.controls.length === 0 && and.negControls.length === 0 && !and.inverse && and.power === 1;
  if (!plain || !(block.workQubits ?? []).includes(and.qubits[2]!)) return null;
  return {
    label: LABEL,
    source: TEMPORARY_AND_SOURCE,
    // Compute and erasure happen once per application; only the action repeats (as for any conjugated block).
    cost: (context) =>
      sumCounts([
        [singleCharge(LABEL, TEMPORARY_AND_SOURCE, tally({ toffoli: 1, cliffords: 2 })), 1],
        [context.countOps(body.action, context.controls, context.negControls, context.inverse), context.times],
      ]),
  };
}
