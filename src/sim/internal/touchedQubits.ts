/**
 * touchedQubits: which local qubits of a block a simulation must hold in its state — every qubit a
 * gate or control touches, except work qubits (Block.workQubits) used only by calls of blocks whose
 * native kernel runs with its work qubits absent. Cached per block and kernel choice.
 */
import type { Block, UnitaryOp } from '../../circuit/types.js';
import type { KernelLookup } from './kernelLookup.js';

const cache = new WeakMap<Block, Map<string, ReadonlySet<number>>>();

function touchedByOps(ops: readonly UnitaryOp[], kernels: KernelLookup, into: Set<number>): void {
  for (const op of ops) {
    for (const q of op.controls) into.add(q);
    for (const q of op.negControls) into.add(q);
    if (op.kind === 'gate') {
      for (const q of op.qubits) into.add(q);
      continue;
    }
    for (const local of touchedQubits(op.block, kernels)) into.add(op.qubits[local] as number);
  }
}

/** Local qubits of `block` that one call of it touches other than as an absent-capable work qubit. */
export function touchedQubits(block: Block, kernels: KernelLookup): ReadonlySet<number> {
  let table = cache.get(block);
  if (!table) {
    table = new Map();
    cache.set(block, table);
  }
  const known = table.get(kernels.key);
  if (known) return known;
  const touched = new Set<number>();
  const spec = kernels.find(block);
  const body = block.body;
  if (spec) {
    const work = new Set(spec.runsWithoutWorkQubits ? block.workQubits ?? [] : []);
    for (let q = 0; q < block.qubits; q++) if (!work.has(q)) touched.add(q);
    const around = spec.simulatedCompute?.(block) ?? 0;
    if (body.kind === 'conjugated') touchedByOps(body.compute.slice(0, around), kernels, touched);
  } else if (body.kind === 'plain') {
    touchedByOps(body.ops, kernels, touched);
  } else {
    touchedByOps(body.compute, kernels, touched);
    touchedByOps(body.action, kernels, touched);
  }
  table.set(kernels.key, touched);
  return touched;
}
