/**
 * unitaryQasmCircuit: reads an OpenQASM 3 program that is meant as a block-encoding — a unitary circuit, with at most
 * final measurements (dropped, with a note) and resets of fresh ancillas (dropped) — into a Circuit of unitary ops that
 * verifyCircuit accepts. A mid-circuit measurement or a real reset is an error naming its line.
 */
import type { Circuit } from '../circuit/types.js';
import { InputError } from '../core/InputError.js';
import { parseQasm } from '../qasm/parseQasm.js';
import { nonUnitaryLines } from './internal/nonUnitaryLines.js';
import { qubitName, unitaryOps } from './internal/unitaryOps.js';

export interface UnitaryQasmCircuit {
  /** The program's registers and its unitary ops only. */
  readonly circuit: Circuit;
  /** What was dropped, one sentence each (e.g. "2 final measurements ignored"). */
  readonly notes: readonly string[];
}

/**
 * @param source the file name used in messages (`file.qasm:7: …`).
 * @param systemRegister the name of the system register (default: the first declared), whose qubits may not be reset.
 * @throws QasmParseError (an InputError) for anything the reader refuses; InputError naming the line of a mid-circuit
 *         measurement or a reset that is not a no-op.
 */
export function unitaryQasmCircuit(text: string, source: string, systemRegister?: string): UnitaryQasmCircuit {
  const parsed = parseQasm(text, source);
  const registers = parsed.qubitRegisters;
  const system = systemRegister === undefined ? registers[0] : registers.find((r) => r.name === systemRegister);
  const systemQubits = new Set(system === undefined ? [] : Array.from({ length: system.size }, (_, k) => system.offset + k));
  const result = unitaryOps(parsed, systemQubits, (q) => qubitName(registers, q));
  if ('problem' in result) {
    const line = nonUnitaryLines(text, registers)[result.problem.nonUnitaryIndex];
    throw new InputError(`${source}${line === undefined ? '' : `:${line}`}: ${result.problem.message}`);
  }
  const notes: string[] = [];
  if (result.droppedMeasurements > 0) notes.push(`${result.droppedMeasurements} final measurement${result.droppedMeasurements === 1 ? '' : 's'} ignored`);
  if (result.droppedResets > 0) notes.push(`${result.droppedResets} reset${result.droppedResets === 1 ? '' : 's'} of fresh ancilla qubits ignored`);
  return { circuit: { qubitRegisters: registers, bitRegisters: parsed.bitRegisters, ops: result.ops }, notes };
}
