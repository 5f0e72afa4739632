/**
 * unaryIterationSelect: recognises a SELECT — a conjugated block whose action applies L ≥ 2 items, each under a
 * distinct pattern of controls on the same index qubits (as linearCombination and pauliLcu build it) — and costs its
 * action by unary iteration instead of the simulated multi-controlled form: L − 1 Toffolis for the iteration, each
 * item applied under a single control, and as many work qubits as index qubits (Babbush et al., Phys. Rev. X 8,
 * 041015, 2018, §III A: a controlled unary iteration over L items costs 4L − 4 T gates, i.e. L − 1 logical ANDs; from
 * memory). Extra controls on the call are first merged into one qubit by logical ANDs. PREPARE (the compute part) is
 * counted as simulated, once whatever the repeat count (only the action repeats).
 */
import type { Block, UnitaryOp } from '../../circuit/types.js';
import type { CostOverride } from '../CostOverride.js';
import { singleCharge, sumCounts, type HierarchyCount } from '../HierarchyCount.js';
import { tally } from '../Tally.js';

export const UNARY_ITERATION_SOURCE = 'Babbush et al., Phys. Rev. X 8, 041015 (2018), unary iteration';

interface Item {
  readonly ops: UnitaryOp[];
}

/** The items of the action when it has the SELECT shape, else null. */
function selectItems(action: readonly UnitaryOp[]): { items: Item[]; indexQubits: number } | null {
  if (action.length < 2) return null;
  const first = action[0]!;
  const index = [...first.controls, ...first.negControls].sort((a, b) => a - b);
  if (index.length === 0) return null;
  const indexKey = index.join(',');
  const items: Item[] = [];
  const seen = new Set<string>();
  let current = '';
  for (const op of action) {
    if ([...op.controls, ...op.negControls].sort((a, b) => a - b).join(',') !== indexKey) return null;
    const pattern = [...op.controls].sort((a, b) => a - b).join(',');
    const stripped: UnitaryOp = { ...op, controls: [], negControls: [] };
    if (pattern === current && items.length > 0) {
      items[items.length - 1]!.ops.push(stripped);
      continue;
    }
    if (seen.has(pattern)) return null;
    seen.add(pattern);
    current = pattern;
    items.push({ ops: [stripped] });
  }
  return items.length >= 2 ? { items, indexQubits: index.length } : null;
}

/** The override for `block` when it is a SELECT, else null. */
export function unaryIterationSelect(block: Block): CostOverride | null {
  const body = block.body;
  if (body.kind !== 'conjugated') return null;
  const shape = selectItems(body.action);
  if (!shape) return null;
  const { items, indexQubits } = shape;
  const L = items.length;
  return {
    label: 'SELECT by unary iteration',
    source: UNARY_ITERATION_SOURCE,
    cost: (context) => {
      const external = context.controls + context.negControls;
      const parts: (readonly [HierarchyCount, number])[] = [
        [context.countOps(body.compute, 0, 0, false), 1],
        [context.countOps(body.compute, 0, 0, true), 1],
        [singleCharge('SELECT by unary iteration', UNARY_ITERATION_SOURCE, tally({
          toffoli: L - 1 + Math.max(0, external - 1),
          cliffords: 2 * context.negControls,
          extraAncillas: indexQubits + Math.max(0, external - 1),
        })), context.times],
      ];
      for (const item of items) parts.push([context.countOps(item.ops, 1, 0, context.inverse), context.times]);
      return sumCounts(parts);
    },
  };
}
