// Syntax tree of the OpenQASM 3 subset produced by the statement parser and consumed by the circuit builder.
import type { Position } from './problem.js';

export type Expr = (
  | { readonly kind: 'number'; readonly value: number }
  | { readonly kind: 'name'; readonly name: string }
  | { readonly kind: 'unary'; readonly op: '-' | '+'; readonly arg: Expr }
  | { readonly kind: 'binary'; readonly op: '+' | '-' | '*' | '/' | '**'; readonly left: Expr; readonly right: Expr }
  | { readonly kind: 'call'; readonly fn: string; readonly arg: Expr }
) & {
  readonly position: Position;
  /** Height of the tree (a leaf has depth 1); bounded by the parser. */
  readonly depth: number;
};

export type Modifier =
  | { readonly kind: 'ctrl' | 'negctrl'; readonly count: Expr | null; readonly position: Position }
  | { readonly kind: 'inv'; readonly position: Position }
  | { readonly kind: 'pow'; readonly exponent: Expr; readonly position: Position };

/** `name` or `name[index]`. */
export interface Operand {
  readonly name: string;
  readonly index: Expr | null;
  readonly position: Position;
}

export interface Identifier {
  readonly name: string;
  readonly position: Position;
}

export interface GateCall {
  readonly kind: 'gateCall';
  readonly modifiers: readonly Modifier[];
  readonly gate: Identifier;
  readonly args: readonly Expr[];
  readonly operands: readonly Operand[];
  readonly position: Position;
}

export type Statement =
  | { readonly kind: 'version'; readonly position: Position }
  | { readonly kind: 'include'; readonly path: string; readonly position: Position }
  | { readonly kind: 'declare'; readonly type: 'qubit' | 'bit'; readonly size: Expr | null; readonly name: Identifier; readonly position: Position }
  | {
      readonly kind: 'gateDefinition';
      readonly name: Identifier;
      readonly params: readonly Identifier[];
      readonly qubits: readonly Identifier[];
      readonly body: readonly GateCall[];
      /** Own-line comment just above the `gate` keyword. */
      readonly comment?: string;
      readonly position: Position;
    }
  | GateCall
  | { readonly kind: 'measure'; readonly qubit: Operand; readonly bit: Operand; readonly position: Position }
  | { readonly kind: 'reset'; readonly operand: Operand; readonly position: Position }
  | { readonly kind: 'barrier'; readonly operands: readonly Operand[]; readonly position: Position };
