/**
 * collectOverrides: walks every block reachable from a root once and fills an override table from a list of rules
 * (each rule looks at one block and returns a CostOverride or null; the first match wins). Caller-given entries are
 * kept and take precedence.
 */
import type { Block, UnitaryOp } from '../circuit/types.js';
import type { CostOverride, OverrideTable } from './CostOverride.js';
import type { MultiControlMethod } from './decompositionTable.js';
import { gidneyAdder } from './overrides/gidneyAdder.js';
import { temporaryAnd } from './overrides/temporaryAnd.js';
import { unaryIterationSelect } from './overrides/unaryIterationSelect.js';

export type OverrideRule = (block: Block) => CostOverride | null;

export interface OverrideRuleOptions {
  /** Cost SELECT blocks by unary iteration (default true). */
  readonly unaryIteration?: boolean;
  /** Cost ripple-carry adders by Gidney's logical-AND adder (default false: Cuccaro's simulated form). */
  readonly gidneyAdder?: boolean;
  /**
   * The decomposition table's multi-control mode (default 'measured'): in 'measured' mode a block holding the AND of two
   * controls in a work qubit around its action (adder pair terms) is costed as a temporary logical-AND erased by
   * measurement (1 Toffoli); otherwise its two ccx count as simulated (2 Toffolis).
   */
  readonly multiControl?: MultiControlMethod;
}

export function defaultOverrideRules(options: OverrideRuleOptions = {}): OverrideRule[] {
  const rules: OverrideRule[] = [];
  if (options.unaryIteration ?? true) rules.push(unaryIterationSelect);
  if (options.gidneyAdder ?? false) rules.push(gidneyAdder);
  if ((options.multiControl ?? 'measured') === 'measured') rules.push(temporaryAnd);
  return rules;
}

/** What defaultOverrideRules reads from `options`, as a key: equal keys, equal rules. */
export function overrideRulesKey(options: OverrideRuleOptions = {}): string {
  return `${options.unaryIteration ?? true}:${options.gidneyAdder ?? false}:${options.multiControl ?? 'measured'}`;
}

function callsOf(block: Block): UnitaryOp[] {
  return block.body.kind === 'plain' ? [...block.body.ops] : [...block.body.compute, ...block.body.action];
}

/** The override table for the hierarchy under `roots`, seeded with `given`. */
export function collectOverrides(roots: readonly Block[], rules: readonly OverrideRule[], given?: OverrideTable): OverrideTable {
  const table: OverrideTable = new WeakMap();
  const seen = new Set<Block>();
  const stack = [...roots];
  while (stack.length > 0) {
    const block = stack.pop()!;
    if (seen.has(block)) continue;
    seen.add(block);
    const fixed = given?.get(block);
    const found = fixed ?? rules.reduce<CostOverride | null>((hit, rule) => hit ?? rule(block), null);
    if (found) table.set(block, found);
    for (const op of callsOf(block)) if (op.kind === 'call') stack.push(op.block);
  }
  return table;
}
