/**
 * gateCounts: exact gate counts by kind for a circuit or block, computed arithmetically over calls,
 * repeats, controls and compute/uncompute pairs (memoised per block), without flattening anything.
 */
import { gateKind } from './gateKind.js';
import type { Block, Circuit, UnitaryOp } from './types.js';

/** Gate kind → number of gates. */
export type GateCounts = Map<string, number>;

function addScaled(target: GateCounts, source: GateCounts, factor: number): void {
  for (const [kind, count] of source) {
    const total = (target.get(kind) ?? 0) + count * factor;
    if (!Number.isSafeInteger(total)) throw new RangeError(`gate count for "${kind}" exceeds 2^53`);
    target.set(kind, total);
  }
}

/** Memoised counts of one block, keyed by the modifiers it is applied under. */
const memo = new WeakMap<Block, Map<string, GateCounts>>();

/** Counts of a list of ops applied under extra controls, inverted or not. */
export function countOps(ops: readonly UnitaryOp[], controls: number, negControls: number, inverse: boolean): GateCounts {
  const counts: GateCounts = new Map();
  for (const op of ops) {
    const c = controls + op.controls.length;
    const n = negControls + op.negControls.length;
    const inv = inverse !== op.inverse;
    if (op.kind === 'gate') {
      addScaled(counts, new Map([[gateKind(op.name, c, n, inv, op.power), 1]]), 1);
    } else {
      addScaled(counts, blockCounts(op.block, c, n, op.power < 0 ? !inv : inv, Math.abs(op.power)), 1);
    }
  }
  return counts;
}

/**
 * Counts of `block` applied `times` times under `controls` positive and `negControls` negative
 * extra controls, inverted or not. In conjugated form only the action is controlled and repeated.
 */
export function blockCounts(block: Block, controls = 0, negControls = 0, inverse = false, times = 1): GateCounts {
  const result: GateCounts = new Map();
  if (times === 0) return result;
  const body = block.body;
  if (body.kind === 'conjugated') {
    addScaled(result, memoised(block, 'compute', 0, 0, false, () => countOps(body.compute, 0, 0, false)), 1);
    addScaled(result, memoised(block, 'uncompute', 0, 0, true, () => countOps(body.compute, 0, 0, true)), 1);
    addScaled(result, memoised(block, 'action', controls, negControls, inverse, () => countOps(body.action, controls, negControls, inverse)), times);
  } else {
    addScaled(result, memoised(block, 'body', controls, negControls, inverse, () => countOps(body.ops, controls, negControls, inverse)), times);
  }
  return result;
}

function memoised(block: Block, part: string, c: number, n: number, inv: boolean, compute: () => GateCounts): GateCounts {
  let table = memo.get(block);
  if (!table) {
    table = new Map();
    memo.set(block, table);
  }
  const key = `${part}:${c}:${n}:${inv}`;
  let counts = table.get(key);
  if (!counts) {
    counts = compute();
    table.set(key, counts);
  }
  return counts;
}

/** Gate counts of a whole circuit (measurements, resets and barriers are not gates). */
export function gateCounts(circuit: Circuit): GateCounts {
  return countOps(
    circuit.ops.filter((op): op is UnitaryOp => op.kind === 'gate' || op.kind === 'call'),
    0,
    0,
    false,
  );
}

const totals = new WeakMap<Block, { body: number; compute: number; action: number }>();

function opsTotal(ops: readonly UnitaryOp[]): number {
  let total = 0;
  for (const op of ops) total += op.kind === 'gate' ? 1 : callTotal(op.block, Math.abs(op.power));
  return total;
}

function callTotal(block: Block, times: number): number {
  if (times === 0) return 0;
  let parts = totals.get(block);
  if (!parts) {
    const body = block.body;
    parts = body.kind === 'plain' ? { body: opsTotal(body.ops), compute: 0, action: 0 } : { body: 0, compute: opsTotal(body.compute), action: opsTotal(body.action) };
    totals.set(block, parts);
  }
  return block.body.kind === 'plain' ? times * parts.body : 2 * parts.compute + times * parts.action;
}

/**
 * Number of primitive gates `circuit` expands to, as a float: exact below 2^53, approximate above,
 * Infinity beyond the double range — for deciding whether a circuit is too large, where gateCounts
 * would throw.
 */
export function expandedGateTotal(circuit: Circuit): number {
  return opsTotal(circuit.ops.filter((op): op is UnitaryOp => op.kind === 'gate' || op.kind === 'call'));
}

/** Number of primitive gates one application of `block` expands to: totalGates(blockCounts(block)) without the kinds. */
export function blockGateTotal(block: Block): number {
  return callTotal(block, 1);
}

/** Sum of all counts. */
export function totalGates(counts: GateCounts): number {
  let total = 0;
  for (const count of counts.values()) total += count;
  return total;
}

/** Counts as a plain object with keys in sorted order (stable for JSON output). */
export function countsToObject(counts: GateCounts): Record<string, number> {
  return Object.fromEntries([...counts.entries()].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));
}
