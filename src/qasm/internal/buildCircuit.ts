// Semantic stage of the OpenQASM reader: walks the parsed statements in order, keeps the symbol
// table (registers and gates), builds Blocks from gate definitions and the Circuit from the rest.
import { CircuitBuilder } from '../../circuit/CircuitBuilder.js';
import { defineBlock } from '../../circuit/defineBlock.js';
import { standardGate } from '../../circuit/standardGates.js';
import type { Block, Circuit, UnitaryOp } from '../../circuit/types.js';
import { integerValue } from './expressionToAngle.js';
import { resolveGateCall, type CallScope, type GateTarget } from './resolveGateCall.js';
import type { Identifier, Operand, Statement } from './syntax.js';
import { fail } from './problem.js';
import { KEYWORDS } from './keywords.js';

/** Most qubits (and, separately, bits) a program may declare in total. */
export const MAX_DECLARED = 1 << 16;
/** Deepest nesting of gate definitions (a gate whose body calls only standard gates has depth 1). */
export const MAX_GATE_NESTING = 256;

const BUILT_IN = new Set(['U', 'gphase']);
const NOT_A_NAME: ReadonlySet<string> = new Set([...KEYWORDS, 'π', 'τ', 'ℇ']);

type Symbol =
  | { readonly kind: 'qubits' | 'bits'; readonly offset: number; readonly size: number }
  | { readonly kind: 'gate'; readonly block: Block };

export class CircuitAssembler {
  private readonly builder = new CircuitBuilder();
  private readonly symbols = new Map<string, Symbol>();
  /** Nesting depth of each defined gate. */
  private readonly nesting = new Map<Block, number>();
  private included = false;
  private statements = 0;
  private qubits = 0;
  private bits = 0;

  /** Processes one statement, failing with a QasmProblem on a semantic error. */
  add(statement: Statement): void {
    const first = this.statements === 0;
    this.statements++;
    switch (statement.kind) {
      case 'version':
        if (!first) fail(statement.position, 'the OPENQASM line as the first statement', 'the OPENQASM version line must be the first statement');
        return;
      case 'include':
        if (statement.path !== 'stdgates.inc') fail(statement.position, '"stdgates.inc"', `cannot include "${statement.path}": only "stdgates.inc" is available`);
        this.included = true;
        return;
      case 'declare':
        return this.declare(statement.type, statement.size === null ? 1 : integerValue(statement.size, 'the register size', 1, MAX_DECLARED), statement.name);
      case 'gateDefinition':
        return this.defineGate(statement);
      case 'gateCall':
        this.builder.add(...resolveGateCall(statement, this.globalScope));
        return;
      case 'measure': {
        const qubits = this.globalScope.operand(statement.qubit);
        const bits = this.bitOperand(statement.bit);
        if (qubits.length !== bits.length) fail(statement.bit.position, `${qubits.length} bit(s) to match the measured qubits`, `cannot measure ${qubits.length} qubit(s) into ${bits.length} bit(s)`);
        qubits.forEach((qubit, k) => this.builder.add({ kind: 'measure', qubit, bit: bits[k] as number }));
        return;
      }
      case 'reset':
        this.globalScope.operand(statement.operand).forEach((qubit) => this.builder.add({ kind: 'reset', qubit }));
        return;
      case 'barrier': {
        // `barrier;` without operands (all qubits, per the specification) is kept as an empty list.
        const qubits = [...new Set(statement.operands.flatMap((o) => this.globalScope.operand(o)))];
        this.builder.add({ kind: 'barrier', qubits });
        return;
      }
    }
  }

  build(): Circuit {
    return this.builder.build();
  }

  private declare(type: 'qubit' | 'bit', size: number, name: Identifier): void {
    this.checkFreeName(name);
    const total = (type === 'qubit' ? this.qubits : this.bits) + size;
    if (total > MAX_DECLARED) fail(name.position, `at most ${MAX_DECLARED} ${type}s in total`, `declaring '${name.name}' exceeds ${MAX_DECLARED} ${type}s in total`);
    if (type === 'qubit') {
      this.symbols.set(name.name, { kind: 'qubits', offset: this.qubits, size });
      this.builder.qubits(name.name, size);
      this.qubits = total;
    } else {
      this.symbols.set(name.name, { kind: 'bits', offset: this.bits, size });
      this.builder.bits(name.name, size);
      this.bits = total;
    }
  }

  private checkFreeName(name: Identifier): void {
    if (NOT_A_NAME.has(name.name) || !/^[A-Za-z_][A-Za-z0-9_]*$/.test(name.name)) {
      fail(name.position, 'a free identifier', `'${name.name}' is a reserved word and cannot be declared`);
    }
    if (this.symbols.has(name.name) || (standardGate(name.name) && (this.included || BUILT_IN.has(name.name)))) {
      fail(name.position, 'a name not declared before', `duplicate declaration of '${name.name}'`);
    }
  }

  private defineGate(statement: Extract<Statement, { kind: 'gateDefinition' }>): void {
    const { name } = statement;
    this.checkFreeName(name);
    if (standardGate(name.name)) fail(name.position, 'a gate name outside the standard library', `gate '${name.name}' is a standard gate name and cannot be redefined`);
    const params = new Map<string, number>();
    const locals = new Map<string, number>();
    const declareLocal = (id: Identifier, table: Map<string, number>): void => {
      if (params.has(id.name) || locals.has(id.name)) fail(id.position, 'distinct parameter names', `parameter '${id.name}' is declared twice in gate '${name.name}'`);
      if (NOT_A_NAME.has(id.name)) fail(id.position, 'a free identifier', `'${id.name}' is a reserved word and cannot name a parameter`);
      table.set(id.name, table.size);
    };
    statement.params.forEach((id) => declareLocal(id, params));
    statement.qubits.forEach((id) => declareLocal(id, locals));
    const scope: CallScope = {
      params,
      gate: (id) => this.gate(id),
      operand: (operand) => {
        const index = locals.get(operand.name);
        if (operand.index !== null) fail(operand.position, 'a qubit parameter name (no index) in a gate body', `gate bodies address qubits by parameter name; found '${operand.name}[…]'`);
        if (index === undefined) fail(operand.position, `a qubit parameter of '${name.name}'`, `unknown qubit '${operand.name}' in gate '${name.name}'`);
        return [index];
      },
    };
    const ops: UnitaryOp[] = statement.body.flatMap((call) => resolveGateCall(call, scope));
    const depth = 1 + ops.reduce((deepest, op) => Math.max(deepest, op.kind === 'call' ? (this.nesting.get(op.block) as number) : 0), 0);
    if (depth > MAX_GATE_NESTING) {
      fail(name.position, `gate definitions nested at most ${MAX_GATE_NESTING} deep`, `gate '${name.name}' nests gate definitions ${depth} levels deep; at most ${MAX_GATE_NESTING} are supported`);
    }
    const block = defineBlock({ name: name.name, role: roleOf(statement.comment, name.name), qubits: locals.size, params: [...params.keys()] }, ops);
    this.nesting.set(block, depth);
    this.symbols.set(name.name, { kind: 'gate', block });
  }

  private gate(id: Identifier): GateTarget {
    const symbol = this.symbols.get(id.name);
    if (symbol?.kind === 'gate') return { kind: 'block', block: symbol.block };
    if (symbol) fail(id.position, 'a gate name', `'${id.name}' is a register, not a gate`);
    const standard = standardGate(id.name);
    if (standard && (this.included || BUILT_IN.has(id.name))) return { kind: 'standard', gate: standard };
    if (standard) fail(id.position, 'include "stdgates.inc" before using standard gates', `gate '${id.name}' needs include "stdgates.inc"; before its first use`);
    return fail(id.position, 'a defined gate', `unknown gate '${id.name}'`);
  }

  private readonly globalScope: CallScope = {
    params: new Map(),
    gate: (id) => this.gate(id),
    operand: (operand) => this.registerOperand(operand, 'qubits'),
  };

  private bitOperand(operand: Operand): readonly number[] {
    return this.registerOperand(operand, 'bits');
  }

  private registerOperand(operand: Operand, kind: 'qubits' | 'bits'): number[] {
    const symbol = this.symbols.get(operand.name);
    const noun = kind === 'qubits' ? 'qubit' : 'bit';
    if (!symbol || symbol.kind !== kind) {
      const why = symbol ? `'${operand.name}' is not a ${noun} register` : `undeclared ${noun} register '${operand.name}'`;
      return fail(operand.position, `a declared ${noun} register`, why);
    }
    if (operand.index === null) return Array.from({ length: symbol.size }, (_, k) => symbol.offset + k);
    return [symbol.offset + integerValue(operand.index, `the index into '${operand.name}'`, 0, symbol.size - 1)];
  }
}

function roleOf(comment: string | undefined, name: string): string {
  if (comment === undefined || comment === '') return 'user-defined gate';
  const prefix = `${name}:`;
  return comment.startsWith(prefix) ? comment.slice(prefix.length).trim() || 'user-defined gate' : comment;
}

