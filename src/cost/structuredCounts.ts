/**
 * structuredCounts: gate counts by structured kind, computed arithmetically on the circuit hierarchy (memoised per block
 * and modifiers) with cost overrides honoured wherever an overridden block is called, scaled by how often it is called.
 * Nothing is flattened. Semantics as src/circuit/gateCounts.ts: in conjugated form only the action is controlled and
 * repeated; a negative block power inverts.
 */
import type { Block, Circuit, UnitaryOp } from '../circuit/types.js';
import type { OverrideTable } from './CostOverride.js';
import { EMPTY_COUNT, sumCounts, type HierarchyCount } from './HierarchyCount.js';
import { invertedKind, kindKey, structuredGateKind, type StructuredGateKind } from './structuredGateKind.js';

interface KindEntry {
  kind: StructuredGateKind;
  count: number;
}

/** The gate part counted inverted: every kind inverted (a bijection on keys, so groups and their order are kept). */
function invertedGates(gates: ReadonlyMap<string, KindEntry>): Map<string, KindEntry> {
  const inverted = new Map<string, KindEntry>();
  for (const entry of gates.values()) {
    const kind = invertedKind(entry.kind);
    inverted.set(kindKey(kind), { kind, count: entry.count });
  }
  return inverted;
}

class Counter {
  private readonly memo = new Map<Block, Map<string, HierarchyCount>>();
  /**
   * The gate part (gates of the list itself, not of called blocks) per op list and modifiers: a list counted under the same
   * controls but the other inverse flag (an action and its adjoint, e.g. inside a QSVT sequence) is then derived, not recounted.
   */
  private readonly gateParts = new WeakMap<readonly UnitaryOp[], Map<string, ReadonlyMap<string, KindEntry>>>();

  constructor(private readonly overrides: OverrideTable) {}

  ops(ops: readonly UnitaryOp[], controls: number, negControls: number, inverse: boolean): HierarchyCount {
    let byModifiers = this.gateParts.get(ops);
    if (!byModifiers) this.gateParts.set(ops, (byModifiers = new Map()));
    const mirrored = byModifiers.get(`${controls}:${negControls}:${!inverse}`);
    const parts: (readonly [HierarchyCount, number])[] = [];
    // Entries are updated in place: one lookup per gate. The entry keeps the last gate's kind, as a replaced entry would.
    const gates = mirrored ? invertedGates(mirrored) : new Map<string, KindEntry>();
    for (const op of ops) {
      const c = controls + op.controls.length;
      const n = negControls + op.negControls.length;
      const inv = inverse !== op.inverse;
      if (op.kind === 'gate') {
        if (mirrored) continue;
        const kind = structuredGateKind(op.name, op.params, c, n, inv, op.power);
        const key = kindKey(kind);
        const entry = gates.get(key);
        if (entry) {
          entry.kind = kind;
          entry.count += 1;
        } else gates.set(key, { kind, count: 1 });
      } else if (op.power !== 0) {
        const blockInverse = op.power < 0 ? !inv : inv;
        const times = Math.abs(op.power);
        parts.push(...this.applications(op.block, c, n, blockInverse, times));
      }
    }
    byModifiers.set(`${controls}:${negControls}:${inverse}`, gates);
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
