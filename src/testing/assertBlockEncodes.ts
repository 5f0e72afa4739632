/**
 * assertBlockEncodes: a test assertion on top of verifyCircuit — returns the verification when the circuit block-encodes
 * the operator within the tolerance, and otherwise throws a BlockEncodingMismatch whose message says α, the error, the
 * worst column (as a basis state of the system register), the clean-register leaks and the notes. It needs no test
 * framework: any runner (vitest, node:test, …) reports a thrown Error as a failure.
 */
import type { Circuit } from '../circuit/types.js';
import type { TargetOperator } from '../operatorFile/TargetOperator.js';
import { unitaryQasmCircuit } from '../verify/unitaryQasmCircuit.js';
import { verifyCircuit, type CircuitVerification, type VerifyCircuitOptions } from '../verify/verifyCircuit.js';

export class BlockEncodingMismatch extends Error {
  override readonly name: string = 'BlockEncodingMismatch';
  constructor(
    message: string,
    /** The figures behind the message. */
    readonly verification: CircuitVerification,
  ) {
    super(message);
  }
}

export function isBlockEncodingMismatch(error: unknown): error is BlockEncodingMismatch {
  return error instanceof BlockEncodingMismatch;
}

function describe(result: CircuitVerification): string {
  const system = result.registers.system;
  const lines = [`the circuit does not block-encode the operator within tolerance ${result.tolerance}:`];
  const alpha = result.alpha === null ? 'no positive α fits' : `α = ${result.alpha}${result.alphaFitted ? ' (fitted)' : ' (given)'}`;
  const where = result.worstColumn !== null
    ? `worst column ${result.worstColumn} = |${result.worstColumn.toString(2).padStart(system.qubits, '0')}>_${system.name}`
    : `worst of ${result.checked} random probes: #${result.worstProbe} (a lower bound)`;
  lines.push(`  ${alpha}; max error ${result.maxError.toExponential(3)}, ${where}`);
  for (const [name, leak] of Object.entries(result.clean)) {
    if (leak > result.tolerance) lines.push(`  clean register '${name}' does not return to |0>: leak ${leak.toExponential(3)}`);
  }
  for (const note of result.notes) lines.push(`  note: ${note}`);
  return lines.join('\n');
}

/**
 * @param circuit  a Circuit, or OpenQASM 3 text (read with unitaryQasmCircuit; `options.source` names it in messages).
 * @param operator the operator meant, e.g. `{ pauli: sum }`, `{ ladder: sum }`, `{ matrix: m }`.
 * @param options  as verifyCircuit (registers, α, tolerance default 1e-8, probes, seed).
 * @returns the verification when `ok`.
 * @throws BlockEncodingMismatch when not; InputError for wrong registers, sizes or a non-unitary circuit.
 */
export function assertBlockEncodes(circuit: Circuit | string, operator: TargetOperator, options: VerifyCircuitOptions & { readonly source?: string } = {}): CircuitVerification {
  const notes: string[] = [];
  let unitary: Circuit;
  if (typeof circuit === 'string') {
    const read = unitaryQasmCircuit(circuit, options.source ?? 'circuit.qasm', options.system);
    unitary = read.circuit;
    notes.push(...read.notes);
  } else unitary = circuit;
  const verification = verifyCircuit(unitary, operator, options);
  const result = { ...verification, notes: [...notes, ...verification.notes] };
  if (!result.ok) throw new BlockEncodingMismatch(describe(result), result);
  return result;
}
