/**
 * CostOverride: a published cost that replaces a block's simulated body wherever the block is called, and the table
 * (WeakMap keyed by block) the counter reads. The caller builds the table (see collectOverrides.ts); no global state.
 */
import type { Block, UnitaryOp } from '../circuit/types.js';
import type { HierarchyCount } from './HierarchyCount.js';

/** What an override sees of one application: the modifiers it is applied under and the counter, for its sub-parts. */
export interface OverrideContext {
  /** Extra positive and negative controls on this application (for a conjugated block they reach only the action). */
  readonly controls: number;
  readonly negControls: number;
  readonly inverse: boolean;
  /** Consecutive applications (a call's |power|); for a conjugated block only the action repeats. */
  readonly times: number;
  /** Counts ops of the block (local qubits) under the given modifiers, honouring the same override table. */
  readonly countOps: (ops: readonly UnitaryOp[], controls: number, negControls: number, inverse: boolean) => HierarchyCount;
}

export interface CostOverride {
  /** What the override stands for, e.g. "SELECT by unary iteration (L = 12)"; charges are grouped by it. */
  readonly label: string;
  /** The published source of the count. */
  readonly source: string;
  /** The count of `times` consecutive applications of the block (the counter scales by how often the call occurs). */
  readonly cost: (context: OverrideContext) => HierarchyCount;
}

export type OverrideTable = WeakMap<Block, CostOverride>;
