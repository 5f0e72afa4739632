/**
 * The hierarchical circuit IR: gate and call operations on qubit indices, blocks (named,
 * parameterised sub-circuits, optionally in compute/action/uncompute form) and whole circuits
 * with named quantum and classical registers. Data only; builders and queries live beside it.
 */
import type { Angle } from './angle.js';

/** Modifiers shared by gate and call operations. Controls come before the operands, in order. */
export interface Modifiers {
  /** Extra positive controls (`ctrl @`): the operation acts when all are |1>. */
  readonly controls: readonly number[];
  /** Extra negative controls (`negctrl @`): the operation acts when all are |0>. */
  readonly negControls: readonly number[];
  /** `inv @`. */
  readonly inverse: boolean;
  /** `pow(k) @`: any real k for gates (principal branch), an integer for block calls (repeat). */
  readonly power: number;
}

/** A standard gate (see standardGates.ts) applied to operand qubits, built-in controls first. */
export interface GateOp extends Modifiers {
  readonly kind: 'gate';
  readonly name: string;
  readonly params: readonly Angle[];
  readonly qubits: readonly number[];
}

/** A call of a block on actual qubits, with angle arguments for the block's parameters. */
export interface CallOp extends Modifiers {
  readonly kind: 'call';
  readonly block: Block;
  readonly args: readonly Angle[];
  readonly qubits: readonly number[];
}

export interface MeasureOp {
  readonly kind: 'measure';
  readonly qubit: number;
  readonly bit: number;
}

export interface ResetOp {
  readonly kind: 'reset';
  readonly qubit: number;
}

export interface BarrierOp {
  readonly kind: 'barrier';
  readonly qubits: readonly number[];
}

/** What may appear inside a block: unitary operations only. */
export type UnitaryOp = GateOp | CallOp;
/** What may appear at the top level of a circuit. */
export type Op = UnitaryOp | MeasureOp | ResetOp | BarrierOp;

/**
 * Body of a block. `plain`: the ops in order. `conjugated`: compute, action, then the inverse of
 * compute; controlling or powering such a block controls or powers only the action.
 */
export type BlockBody =
  | { readonly kind: 'plain'; readonly ops: readonly UnitaryOp[] }
  | { readonly kind: 'conjugated'; readonly compute: readonly UnitaryOp[]; readonly action: readonly UnitaryOp[] };

/** A named, parameterised sub-circuit on `qubits` local qubits (indices 0 … qubits−1). */
export interface Block {
  /** Identifier (a valid OpenQASM identifier, not a standard gate name). */
  readonly name: string;
  /** One line saying what the block is for; written as a comment beside its definition. */
  readonly role: string;
  /** Names of the angle parameters, referenced in the body by param(index). */
  readonly params: readonly string[];
  readonly qubits: number;
  readonly body: BlockBody;
  /** Optional id of a simulator kernel that computes the same unitary as the body in one pass. */
  readonly nativeKernel?: string;
  /** Numbers the native kernel reads besides the call's arguments, fixed when the block is defined. */
  readonly kernelData?: NativeKernelData;
  /**
   * Local work qubits: each returns to |0> whenever it starts in |0>, whatever the other qubits hold
   * (compute/uncompute registers). A simulator may leave such a qubit out of the state.
   */
  readonly workQubits?: readonly number[];
}

/** Named lists of numbers (qubit indices, integer weights, angles) that a native kernel reads. */
export type NativeKernelData = Readonly<Record<string, readonly number[]>>;

export interface Register {
  readonly name: string;
  readonly size: number;
  /** Index of the register's first qubit (or bit) in the circuit. */
  readonly offset: number;
}

export interface Circuit {
  readonly qubitRegisters: readonly Register[];
  readonly bitRegisters: readonly Register[];
  readonly ops: readonly Op[];
}

export const NO_MODIFIERS: Modifiers = { controls: [], negControls: [], inverse: false, power: 1 };
