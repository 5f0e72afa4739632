/**
 * depthBound: an upper bound on circuit depth without flattening. Ops are layered as soon as their
 * qubits are free; a call counts its block's own bound (times its repeats), and a controlled call —
 * whose gates all share the control — counts its controlled gates one after another.
 */
import { countOps, totalGates } from './gateCounts.js';
import type { Block, Circuit, Op, UnitaryOp } from './types.js';

const memo = new WeakMap<Block, { body: number; compute: number; action: number }>();

function blockDepths(block: Block): { body: number; compute: number; action: number } {
  let depths = memo.get(block);
  if (!depths) {
    const body = block.body;
    if (body.kind === 'plain') {
      const d = layeredDepth(body.ops, block.qubits);
      depths = { body: d, compute: 0, action: d };
    } else {
      const compute = layeredDepth(body.compute, block.qubits);
      const action = layeredDepth(body.action, block.qubits);
      depths = { body: 2 * compute + action, compute, action };
    }
    memo.set(block, depths);
  }
  return depths;
}

function opDepth(op: Op): number {
  if (op.kind === 'gate' || op.kind === 'measure' || op.kind === 'reset') return 1;
  if (op.kind === 'barrier') return 0;
  const times = Math.abs(op.power);
  if (times === 0) return 0;
  const depths = blockDepths(op.block);
  if (op.controls.length + op.negControls.length === 0) {
    return op.block.body.kind === 'plain' ? times * depths.body : 2 * depths.compute + times * depths.action;
  }
  // Under a control every gate of the controlled part waits for the shared control qubit.
  const body = op.block.body;
  const controlledPart = body.kind === 'plain' ? body.ops : body.action;
  const serial = times * totalGates(countOps(controlledPart, 1, 0, false));
  return body.kind === 'plain' ? serial : 2 * depths.compute + serial;
}

function operands(op: Op): readonly number[] {
  if (op.kind === 'measure' || op.kind === 'reset') return [op.qubit];
  if (op.kind === 'barrier') return op.qubits;
  return [...op.controls, ...op.negControls, ...op.qubits];
}

function layeredDepth(ops: readonly (Op | UnitaryOp)[], qubits: number): number {
  const free = new Float64Array(qubits);
  let depth = 0;
  for (const op of ops) {
    const qs = operands(op);
    let start = 0;
    for (const q of qs) start = Math.max(start, free[q] as number);
    const end = start + opDepth(op);
    for (const q of qs) free[q] = end;
    depth = Math.max(depth, end);
  }
  return depth;
}

/** Upper bound on the depth of `circuit`. */
export function depthBound(circuit: Circuit): number {
  const qubits = circuit.qubitRegisters.reduce((sum, r) => sum + r.size, 0);
  return layeredDepth(circuit.ops, qubits);
}
