/**
 * structuredCounts: gate counts by structured kind, computed arithmetically on the circuit hierarchy (memoised per block
 * and modifiers) with cost overrides honoured wherever an overridden block is called, scaled by how often it is called.
 * Nothing is flattened. Semantics as src/circuit/gateCounts.ts: in conjugated form only the action is controlled and
 * repeated; a negative block power inverts.
 */
import type { Block, Circuit, UnitaryOp } from '../circuit/types.js';
import type { OverrideTable } from './CostOverride.js';
import { EMPTY_COUNT, sumCounts, type HierarchyCount, type KindCount } from './HierarchyCount.js';
import { kindKey, structuredGateKind } from './structuredGateKind.js';

class Counter {
  private readonly memo = new Map<Block, Map<string, HierarchyCount>>();

  constructor(private readonly overrides: OverrideTable) {}

  ops(ops: readonly UnitaryOp[], controls: number, negControls: number, inverse: boolean): HierarchyCount {
    const parts: (readonly [HierarchyCount, number])[] = [];
    const gates = new Map<string, KindCount>();
    for (const op of ops) {
      const c = controls + op.controls.length;
      const n = negControls + op.negControls.length;
      const inv = inverse !== op.inverse;
      if (op.kind === 'gate') {
        const kind = structuredGateKind(op.name, op.params, c, n, inv, op.power);
        const key = kindKey(kind);
        gates.set(key, { kind, count: (gates.get(key)?.count ?? 0) + 1 });
      } else if (op.power !== 0) {
        const blockInverse = op.power < 0 ? !inv : inv;
        const times = Math.abs(op.power);
        parts.push(...this.applications(op.block, c, n, blockInverse, times));
      }
    }
    if (gates.size > 0) parts.push([{ kinds: gates, charges: new Map() }, 1]);
    return parts.length === 0 ? EMPTY_COUNT : parts.length === 1 && parts[0]![1] === 1 ? parts[0]![0] : sumCounts(parts);
  }

  /** `times` consecutive applications of `block`, as weighted parts: in conjugated form compute and uncompute once. */
  applications(block: Block, controls: number, negControls: number, inverse: boolean, times: number): (readonly [HierarchyCount, number])[] {
    if (this.overrides.has(block)) return [[this.overridden(block, controls, negControls, inverse, times), 1]];
    const body = block.body;
    if (body.kind === 'plain') {
      return [[this.memoised(block, `body:${controls}:${negControls}:${inverse}`, () => this.ops(body.ops, controls, negControls, inverse)), times]];
    }
    const pair = this.memoised(block, 'pair', () => sumCounts([[this.ops(body.compute, 0, 0, false), 1], [this.ops(body.compute, 0, 0, true), 1]]));
    const action = this.memoised(block, `action:${controls}:${negControls}:${inverse}`, () => this.ops(body.action, controls, negControls, inverse));
    return [[pair, 1], [action, times]];
  }

  /** `times` consecutive applications of an overridden block, as its override says. */
  private overridden(block: Block, controls: number, negControls: number, inverse: boolean, times: number): HierarchyCount {
    const override = this.overrides.get(block)!;
    return this.memoised(block, `${controls}:${negControls}:${inverse}:${times}`, () =>
      override.cost({ controls, negControls, inverse, times, countOps: (ops, c, n, inv) => this.ops(ops, c, n, inv) }),
    );
  }

  private memoised(block: Block, key: string, compute: () => HierarchyCount): HierarchyCount {
    let table = this.memo.get(block);
    if (!table) {
      table = new Map();
      this.memo.set(block, table);
    }
    const cached = table.get(key);
    if (cached) return cached;
    const counts = compute();
    table.set(key, counts);
    return counts;
  }
}

/** Counts of one application of `block` under extra controls, inverted or not, with `overrides` honoured. */
export function structuredBlockCounts(
  block: Block,
  overrides: OverrideTable = new WeakMap(),
  modifiers: { readonly controls?: number; readonly negControls?: number; readonly inverse?: boolean } = {},
): HierarchyCount {
  return sumCounts(new Counter(overrides).applications(block, modifiers.controls ?? 0, modifiers.negControls ?? 0, modifiers.inverse ?? false, 1));
}

/** Counts of a whole circuit (measurements, resets and barriers are not gates). */
export function structuredCircuitCounts(circuit: Circuit, overrides: OverrideTable = new WeakMap()): HierarchyCount {
  const unitary = circuit.ops.filter((op): op is UnitaryOp => op.kind === 'gate' || op.kind === 'call');
  return new Counter(overrides).ops(unitary, 0, 0, false);
}
