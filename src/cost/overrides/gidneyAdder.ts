/**
 * gidneyAdder: optional override costing a ripple-carry adder block (src/arithmetic/cuccaroAdder.ts, width w) by
 * Gidney's adder with temporary logical-ANDs instead of Cuccaro's MAJ/UMA form: w − 1 ANDs (4 T each, erased by
 * measurement) and w − 1 work qubits (Gidney, Quantum 2, 74, 2018: T-count 4n + O(1)); the plain Cuccaro form has
 * 2w − 2 Toffolis modulo 2^w and 2w − 1 with a carry out (Cuccaro et al., arXiv:quant-ph/0410184, 2004). Controlled
 * calls keep the simulated body (Gidney's controlled adder is not modelled).
 */
import type { Block } from '../../circuit/types.js';
import type { CostOverride } from '../CostOverride.js';
import { singleCharge, sumCounts } from '../HierarchyCount.js';
import { tally } from '../Tally.js';

export const GIDNEY_ADDER_SOURCE = 'Gidney, Quantum 2, 74 (2018), temporary logical-AND adder';
const RIPPLE_NAME = /^cuccaro_adder(_carry)?_(\d+)$/;

export function gidneyAdder(block: Block): CostOverride | null {
  const match = RIPPLE_NAME.exec(block.name);
  if (!match || block.body.kind !== 'plain') return null;
  const width = Number(match[2]);
  const carry = match[1] !== undefined;
  const ops = block.body.ops;
  return {
    label: 'ripple adder by temporary logical-ANDs',
    source: GIDNEY_ADDER_SOURCE,
    cost: (context) => {
      if (context.controls + context.negControls > 0) {
        return sumCounts([[context.countOps(ops, context.controls, context.negControls, context.inverse), context.times]]);
      }
      const ands = width - 1 + (carry ? 1 : 0);
      return sumCounts([[singleCharge('ripple adder by temporary logical-ANDs', GIDNEY_ADDER_SOURCE, tally({ toffoli: ands, cliffords: 6 * width, extraAncillas: ands })), context.times]]);
    },
  };
}
