// Recursive-descent statement parser: yields the statements of the OpenQASM 3 subset one by one, so
// that the circuit builder can report problems in source order.
import { parseExpression } from './parseExpression.js';
import type { Expr, GateCall, Identifier, Modifier, Operand, Statement } from './syntax.js';
import type { TokenCursor } from './TokenCursor.js';
import { fail } from './problem.js';
import { UNSUPPORTED_STATEMENTS } from './keywords.js';

const STATEMENT = 'a declaration, gate definition, gate call, measure, reset or barrier';
const MODIFIERS = new Set(['ctrl', 'negctrl', 'inv', 'pow']);
const NOT_IN_GATE_BODY = new Set(['OPENQASM', 'include', 'qubit', 'bit', 'qreg', 'creg', 'gate', 'measure', 'reset', 'barrier', ...UNSUPPORTED_STATEMENTS]);

function identifier(cursor: TokenCursor, what: string): Identifier {
  const token = cursor.expectIdentifier(what);
  return { name: token.text, position: token };
}

function operand(cursor: TokenCursor, what: string): Operand {
  const name = cursor.expectIdentifier(what);
  let index: Expr | null = null;
  if (cursor.accept('[')) {
    index = parseExpression(cursor);
    cursor.expect(']', 'after the index');
  }
  return { name: name.text, index, position: name };
}

function modifier(cursor: TokenCursor): Modifier {
  const token = cursor.next();
  let result: Modifier;
  if (token.text === 'inv') result = { kind: 'inv', position: token };
  else if (token.text === 'pow') {
    cursor.expect('(', "after 'pow'");
    const exponent = parseExpression(cursor);
    cursor.expect(')', 'after the exponent');
    result = { kind: 'pow', exponent, position: token };
  } else {
    let count: Expr | null = null;
    if (cursor.accept('(')) {
      count = parseExpression(cursor);
      cursor.expect(')', 'after the control count');
    }
    result = { kind: token.text as 'ctrl' | 'negctrl', count, position: token };
  }
  cursor.expect('@', `after the '${token.text}' modifier`);
  return result;
}

function gateCall(cursor: TokenCursor, inBody: boolean): GateCall {
  const position = cursor.position;
  const modifiers: Modifier[] = [];
  while (cursor.current.kind === 'identifier' && MODIFIERS.has(cursor.current.text)) modifiers.push(modifier(cursor));
  if (inBody && NOT_IN_GATE_BODY.has(cursor.current.text)) cursor.failHere("a gate call or '}' in the gate body");
  const gate = identifier(cursor, inBody ? "a gate call or '}' in the gate body" : 'a gate name');
  const args: Expr[] = [];
  if (cursor.accept('(')) {
    if (!cursor.is(')')) {
      do args.push(parseExpression(cursor));
      while (cursor.accept(','));
    }
    cursor.expect(')', 'after the gate arguments');
  }
  const operands: Operand[] = [];
  if (!cursor.is(';')) {
    do operands.push(operand(cursor, 'a qubit operand'));
    while (cursor.accept(','));
  }
  cursor.expect(';', 'after gate call');
  return { kind: 'gateCall', modifiers, gate, args, operands, position };
}

function identifierList(cursor: TokenCursor, what: string, stop: string): Identifier[] {
  const list: Identifier[] = [];
  if (cursor.is(stop)) return list;
  do list.push(identifier(cursor, what));
  while (cursor.accept(','));
  return list;
}

function gateDefinition(cursor: TokenCursor): Statement {
  const keyword = cursor.next();
  const name = identifier(cursor, "a gate name after 'gate'");
  let params: Identifier[] = [];
  if (cursor.accept('(')) {
    params = identifierList(cursor, 'a parameter name', ')');
    cursor.expect(')', 'after the gate parameters');
  }
  const qubits = identifierList(cursor, 'a qubit parameter name', '{');
  cursor.expect('{', 'to open the gate body');
  const body: GateCall[] = [];
  while (!cursor.is('}')) {
    if (cursor.current.kind === 'end') cursor.failHere("'}' to close the gate body");
    body.push(gateCall(cursor, true));
  }
  cursor.next();
  const comment = keyword.comment !== undefined ? { comment: keyword.comment } : {};
  return { kind: 'gateDefinition', name, params, qubits, body, ...comment, position: keyword };
}

function declaration(cursor: TokenCursor): Statement {
  const keyword = cursor.next();
  let size: Expr | null = null;
  if (cursor.accept('[')) {
    size = parseExpression(cursor);
    cursor.expect(']', 'after the register size');
  }
  const name = identifier(cursor, 'a register name');
  cursor.expect(';', 'after the declaration');
  return { kind: 'declare', type: keyword.text as 'qubit' | 'bit', size, name, position: keyword };
}

function keywordStatement(cursor: TokenCursor): Statement | undefined {
  const token = cursor.current;
  switch (token.text) {
    case 'OPENQASM': {
      cursor.next();
      const version = cursor.current;
      if (version.kind !== 'integer' && version.kind !== 'float') cursor.failHere('a version number after OPENQASM');
      cursor.next();
      cursor.expect(';', 'after the version');
      if (!/^3(\.\d+)?$/.test(version.text)) fail(version, 'version 3', `unsupported OpenQASM version ${version.text}`);
      return { kind: 'version', position: token };
    }
    case 'include': {
      cursor.next();
      const path = cursor.current;
      if (path.kind !== 'string') cursor.failHere('a file name in quotes after include');
      cursor.next();
      cursor.expect(';', 'after the include');
      return { kind: 'include', path: path.text, position: path };
    }
    case 'qubit':
    case 'bit':
      return declaration(cursor);
    case 'qreg':
    case 'creg': {
      const replacement = `'${token.text === 'qreg' ? 'qubit' : 'bit'}[n] name;'`;
      return fail(token, replacement, `OpenQASM 2 declaration '${token.text}' is not supported; expected ${replacement}`);
    }
    case 'gate':
      return gateDefinition(cursor);
    case 'measure': {
      cursor.next();
      const qubit = operand(cursor, 'a qubit to measure');
      cursor.expect('->', 'after the measured qubit');
      const bit = operand(cursor, 'a bit to store the result');
      cursor.expect(';', 'after the measurement');
      return { kind: 'measure', qubit, bit, position: token };
    }
    case 'reset': {
      cursor.next();
      const target = operand(cursor, 'a qubit to reset');
      cursor.expect(';', 'after reset');
      return { kind: 'reset', operand: target, position: token };
    }
    case 'barrier': {
      cursor.next();
      const operands: Operand[] = [];
      if (!cursor.is(';')) {
        do operands.push(operand(cursor, 'a qubit operand'));
        while (cursor.accept(','));
      }
      cursor.expect(';', 'after barrier');
      return { kind: 'barrier', operands, position: token };
    }
    default:
      return undefined;
  }
}

function statement(cursor: TokenCursor): Statement {
  const token = cursor.current;
  if (token.kind !== 'identifier') return cursor.failHere(STATEMENT);
  const keyword = keywordStatement(cursor);
  if (keyword) return keyword;
  if (UNSUPPORTED_STATEMENTS.has(token.text)) return fail(token, STATEMENT, `unsupported statement '${token.text}': expected ${STATEMENT}`);
  const after = cursor.peek(1);
  if (after.kind === 'punctuation' && (after.text === '[' || after.text === '=')) {
    const bit = operand(cursor, 'a bit');
    cursor.expect('=', 'before measure');
    cursor.expect('measure', "after '='");
    const qubit = operand(cursor, 'a qubit to measure');
    cursor.expect(';', 'after the measurement');
    return { kind: 'measure', qubit, bit, position: token };
  }
  return gateCall(cursor, false);
}

/** Yields the statements at the cursor until the end of input. */
export function* parseStatements(cursor: TokenCursor): Generator<Statement> {
  while (cursor.current.kind !== 'end') yield statement(cursor);
  cursor.next();
}
