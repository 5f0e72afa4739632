/**
 * hadamardTestCircuit: the Hadamard test of a block-encoding U on a prepared state (CONVENTIONS.md; Aharonov, Jones &
 * Landau, STOC 2006): prepare ψ on the system register, the test qubit in |+>, U controlled by the test qubit, then
 * (for the imaginary part) S†, then H, and measure the test qubit into the one classical bit. With the ancillas in
 * |0>, P(bit = 0) = (1 + Re <ψ,0|U|ψ,0>)/2, or (1 + Im <ψ,0|U|ψ,0>)/2 with S†.
 * A controlled call of a compute/action/uncompute block controls only its action (the IR's rule).
 */
import { CircuitBuilder } from '../circuit/CircuitBuilder.js';
import { call, gate } from '../circuit/ops.js';
import type { Block, Circuit } from '../circuit/types.js';
import { ancillaQubits, type BlockEncoding } from '../blocks/BlockEncoding.js';

export type TestComponent = 're' | 'im';

/** Register layout: `system` (qubits 0…n−1), `ancilla` (n…n+a−1, when a > 0), `test` (n+a); one bit `result`. */
export function hadamardTestCircuit(encoding: BlockEncoding, preparation: Block, component: TestComponent): Circuit {
  const n = encoding.systemQubits;
  if (preparation.qubits !== n) throw new RangeError(`hadamardTestCircuit: preparation acts on ${preparation.qubits} qubits, the system has ${n}`);
  const builder = new CircuitBuilder();
  const system = builder.qubits('system', n);
  const a = ancillaQubits(encoding);
  const ancilla = a > 0 ? builder.qubits('ancilla', a) : [];
  const [test] = builder.qubits('test', 1) as [number];
  const [result] = builder.bits('result', 1) as [number];
  builder.add(call(preparation, system), gate('h', [test]), call(encoding.block, [...system, ...ancilla], [], { controls: [test] }));
  if (component === 'im') builder.add(gate('sdg', [test]));
  builder.add(gate('h', [test]));
  builder.measure(test, result);
  return builder.build();
}
