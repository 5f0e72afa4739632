/**
 * parseQasm: reads an OpenQASM 3 program (the subset polewright writes plus common hand-written
 * forms) into a Circuit. Every failure becomes a QasmParseError with line, column and expectation.
 */
import type { Circuit } from '../circuit/types.js';
import { CircuitAssembler } from './internal/buildCircuit.js';
import { tokenize } from './internal/lexer.js';
import { parseStatements } from './internal/parseStatements.js';
import { QasmProblem, type Position } from './internal/problem.js';
import { TokenCursor } from './internal/TokenCursor.js';
import { QasmParseError } from './QasmParseError.js';

/**
 * Parses `text` (named `source` in messages, e.g. its file path) into a Circuit.
 *
 * Accepted: an optional `OPENQASM 3;` line, `include "stdgates.inc";`, `qubit`/`bit` declarations
 * (sized or single), `gate` definitions with parameters (they become Blocks; an own-line `//`
 * comment just above gives the role, a leading `<name>:` stripped), gate calls with `ctrl`,
 * `negctrl`, `inv` and `pow` modifiers and register broadcast, `measure` (both forms), `reset`,
 * `barrier`, and angle expressions with pi/tau/euler, + − * / ** and the standard functions.
 *
 * @throws QasmParseError for anything else, and for semantic errors (unknown gate, wrong arity,
 * index out of range, repeated operand, duplicate declaration, non-integer power of a user gate);
 * it never throws any other error.
 */
export function parseQasm(text: string, source: string): Circuit {
  let where: () => Position = () => ({ line: 1, column: 1 });
  try {
    const cursor = new TokenCursor(tokenize(text));
    const assembler = new CircuitAssembler();
    where = () => cursor.position;
    for (const statement of parseStatements(cursor)) {
      where = () => statement.position;
      assembler.add(statement);
      where = () => cursor.position;
    }
    return assembler.build();
  } catch (error) {
    if (error instanceof QasmProblem) {
      throw new QasmParseError(source, error.position.line, error.position.column, error.expected, error.detail);
    }
    const { line, column } = where();
    const detail = error instanceof Error ? error.message : String(error);
    throw new QasmParseError(source, line, column, 'a valid program', `invalid program: ${detail}`);
  }
}
