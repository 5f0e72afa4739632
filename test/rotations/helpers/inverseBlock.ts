// Test-only: a block whose body is `inv @` the given block, so the reference simulator can run U†.
import { defineBlock } from '../../../src/circuit/defineBlock.js';
import { call } from '../../../src/circuit/ops.js';
import type { Block } from '../../../src/circuit/types.js';

export function inverseBlock(block: Block): Block {
  const qubits = Array.from({ length: block.qubits }, (_, q) => q);
  return defineBlock({ name: `${block.name}_inverse`, role: 'test inverse', qubits: block.qubits }, [call(block, qubits, [], { inverse: true })]);
}

/** Blocks applied one after another (first in the list first). */
export function sequence(blocks: readonly Block[]): Block {
  const qubits = Array.from({ length: blocks[0]!.qubits }, (_, q) => q);
  return defineBlock({ name: 'test_sequence', role: 'test sequence', qubits: qubits.length }, blocks.map((b) => call(b, qubits)));
}
