/**
 * defineBlock and defineConjugatedBlock: create a Block after checking its name and every
 * operation of its body against its own qubit and parameter counts.
 */
import { standardGate } from './standardGates.js';
import type { Block, NativeKernelData, UnitaryOp } from './types.js';
import { validateUnitaryOp } from './internal/validateOps.js';

const IDENTIFIER = /^[A-Za-z_][A-Za-z0-9_]*$/;
const RESERVED = new Set([
  'OPENQASM', 'include', 'qubit', 'bit', 'gate', 'measure', 'reset', 'barrier', 'ctrl', 'negctrl', 'inv', 'pow',
  'pi', 'tau', 'euler', 'if', 'else', 'for', 'while', 'def', 'return', 'let', 'const', 'int', 'uint', 'float',
  'angle', 'bool', 'complex', 'input', 'output', 'qreg', 'creg', 'in', 'box', 'delay', 'durationof', 'sin', 'cos',
  'tan', 'arcsin', 'arccos', 'arctan', 'exp', 'log', 'sqrt', 'mod', 'end', 'break', 'continue', 'extern', 'defcal',
  'cal', 'defcalgrammar', 'duration', 'stretch', 'array', 'true', 'false', 'im',
]);

export interface BlockOptions {
  readonly name: string;
  readonly role: string;
  readonly qubits: number;
  readonly params?: readonly string[];
  readonly nativeKernel?: string;
  /** Data for the native kernel (see Block.kernelData). */
  readonly kernelData?: NativeKernelData;
  /** Local qubits the block returns to |0> whenever they start in |0> (see Block.workQubits). */
  readonly workQubits?: readonly number[];
}

function checkHeader(options: BlockOptions): void {
  if (!IDENTIFIER.test(options.name) || RESERVED.has(options.name) || standardGate(options.name)) {
    throw new RangeError(`block name "${options.name}" is not a free identifier`);
  }
  if (!Number.isInteger(options.qubits) || options.qubits < 0) throw new RangeError(`block ${options.name}: bad qubit count`);
  for (const p of options.params ?? []) {
    if (!IDENTIFIER.test(p) || RESERVED.has(p)) throw new RangeError(`block ${options.name}: bad parameter name "${p}"`);
  }
  const work = options.workQubits ?? [];
  if (new Set(work).size !== work.length || work.some((q) => !Number.isInteger(q) || q < 0 || q >= options.qubits)) {
    throw new RangeError(`block ${options.name}: work qubits ${JSON.stringify(work)} are not distinct qubits of the block`);
  }
  for (const [key, values] of Object.entries(options.kernelData ?? {})) {
    if (!values.every((v) => Number.isFinite(v))) throw new RangeError(`block ${options.name}: kernel data "${key}" is not a list of finite numbers`);
  }
}

function checkOps(options: BlockOptions, ops: readonly UnitaryOp[]): void {
  ops.forEach((op, index) =>
    validateUnitaryOp(op, options.qubits, options.params?.length ?? 0, `block ${options.name}, op ${index}`),
  );
}

function header(options: BlockOptions): Omit<Block, 'body'> {
  return {
    name: options.name,
    role: options.role,
    params: options.params ?? [],
    qubits: options.qubits,
    ...(options.nativeKernel !== undefined ? { nativeKernel: options.nativeKernel } : {}),
    ...(options.kernelData !== undefined ? { kernelData: options.kernelData } : {}),
    ...(options.workQubits !== undefined && options.workQubits.length > 0 ? { workQubits: [...options.workQubits] } : {}),
  };
}

/** A block whose body is `ops` in order. */
export function defineBlock(options: BlockOptions, ops: readonly UnitaryOp[]): Block {
  checkHeader(options);
  checkOps(options, ops);
  return { ...header(options), body: { kind: 'plain', ops } };
}

/** A block computing `compute`, then `action`, then the inverse of `compute`; controls reach only `action`. */
export function defineConjugatedBlock(
  options: BlockOptions,
  compute: readonly UnitaryOp[],
  action: readonly UnitaryOp[],
): Block {
  checkHeader(options);
  checkOps(options, compute);
  checkOps(options, action);
  return { ...header(options), body: { kind: 'conjugated', compute, action } };
}
