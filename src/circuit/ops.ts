/**
 * Constructors for IR operations: gate(…) and call(…) with optional modifiers, and the modifier
 * combinators controlled(…), inverted(…), repeated(…) that return a new op without copying bodies.
 */
import type { Angle } from './angle.js';
import type { Block, CallOp, GateOp, Modifiers, UnitaryOp } from './types.js';

export type ModifierOptions = Partial<Modifiers>;

// The modifiers are written out field by field (no spread of a helper object): circuits hold up to ~10^5 ops built here.

/** A standard gate on `qubits` (built-in controls first), e.g. gate('cx', [0, 1]). */
export function gate(name: string, qubits: readonly number[], params: readonly Angle[] = [], options: ModifierOptions = {}): GateOp {
  return {
    kind: 'gate', name, params, qubits,
    controls: options.controls ?? [], negControls: options.negControls ?? [], inverse: options.inverse ?? false, power: options.power ?? 1,
  };
}

/** A call of `block` on `qubits`. */
export function call(block: Block, qubits: readonly number[], args: readonly Angle[] = [], options: ModifierOptions = {}): CallOp {
  return {
    kind: 'call', block, args, qubits,
    controls: options.controls ?? [], negControls: options.negControls ?? [], inverse: options.inverse ?? false, power: options.power ?? 1,
  };
}

/** The same op with extra positive (and negative) controls prepended. */
export function controlled<T extends UnitaryOp>(op: T, controls: readonly number[], negControls: readonly number[] = []): T {
  return { ...op, controls: [...controls, ...op.controls], negControls: [...negControls, ...op.negControls] };
}

/** The adjoint of the op. */
export function inverted<T extends UnitaryOp>(op: T): T {
  return { ...op, inverse: !op.inverse };
}

/** The op applied `times` times in a row (power multiplied; no body is copied). */
export function repeated<T extends UnitaryOp>(op: T, times: number): T {
  return { ...op, power: op.power * times };
}
