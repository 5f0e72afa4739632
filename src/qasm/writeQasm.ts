/**
 * writeQasm: writes a Circuit as an OpenQASM 3 program that parseQasm reads back to the same state
 * and the same gate counts; deterministic (same circuit in, same bytes out).
 */
import type { Circuit, Op, Register } from '../circuit/types.js';
import { QasmDefinitions } from './internal/QasmDefinitions.js';

function globalName(registers: readonly Register[], names: readonly string[], index: number, what: string): string {
  const k = registers.findIndex((r) => index >= r.offset && index < r.offset + r.size);
  if (k < 0) throw new RangeError(`writeQasm: ${what} ${index} is not in any register`);
  return `${names[k] as string}[${index - (registers[k] as Register).offset}]`;
}

/**
 * The OpenQASM 3 text of `circuit`: header and `include "stdgates.inc";`, one `gate` definition per
 * distinct block (deduplicated by identity and by identical text, dependencies first, each after a
 * `// name: role` comment), one declaration per register, then the operations.
 *
 * A conjugated block (compute, action, uncompute) is written as `<name>_compute`, `<name>_action` and
 * `<name>` = compute; action; inv @ compute. A call of it that is controlled or repeated (|power| ≠ 1)
 * is written inline — compute; the action with the controls, inversion and power; inv @ compute —
 * and a plain block that contains such calls, when controlled, gets a specialised definition
 * `<name>_c<k>n<m>` taking its controls as leading qubits, so controls never reach a compute part.
 * Register and block names that clash with OpenQASM words, standard gates or each other get a `_2`,
 * `_3`, … suffix.
 *
 * @throws RangeError for malformed IR: non-finite angles or powers, names that are not identifiers.
 */
export function writeQasm(circuit: Circuit): string {
  return writeQasmNamed(circuit).text;
}

/** writeQasm's text with the register names it chose, in the circuit's register order (a clashing name gets its suffix). */
export function writeQasmNamed(circuit: Circuit): { readonly text: string; readonly qubitRegisterNames: readonly string[]; readonly bitRegisterNames: readonly string[] } {
  const definitions = new QasmDefinitions();
  const qubitNames = circuit.qubitRegisters.map((r) => definitions.reserve(r.name));
  const bitNames = circuit.bitRegisters.map((r) => definitions.reserve(r.name));
  const qubit = (index: number): string => globalName(circuit.qubitRegisters, qubitNames, index, 'qubit');
  const bit = (index: number): string => globalName(circuit.bitRegisters, bitNames, index, 'bit');
  const ctx = { qubit, params: [], controls: [], negControls: [] };
  const body = circuit.ops.flatMap((op: Op): string[] => {
    switch (op.kind) {
      case 'measure':
        return [`${bit(op.bit)} = measure ${qubit(op.qubit)};`];
      case 'reset':
        return [`reset ${qubit(op.qubit)};`];
      case 'barrier':
        return [op.qubits.length > 0 ? `barrier ${op.qubits.map(qubit).join(', ')};` : 'barrier;'];
      default:
        return definitions.writeOps([op], ctx);
    }
  });
  const declarations = [
    ...circuit.qubitRegisters.map((r, k) => `qubit[${r.size}] ${qubitNames[k] as string};`),
    ...circuit.bitRegisters.map((r, k) => `bit[${r.size}] ${bitNames[k] as string};`),
  ];
  const sections = [['OPENQASM 3.0;', 'include "stdgates.inc";'].join('\n'), ...definitions.texts, declarations.join('\n'), body.join('\n')];
  return { text: sections.filter((s) => s !== '').join('\n\n') + '\n', qubitRegisterNames: qubitNames, bitRegisterNames: bitNames };
}
