/**
 * QasmParseError: the one error the OpenQASM 3 reader throws — a position in the source text,
 * what was expected there, and a message of the form `file.qasm:3:14: expected ';' …, found 'h'`.
 */
import { InputError } from '../core/InputError.js';

export class QasmParseError extends InputError {
  override readonly name: string = 'QasmParseError';
  /** Name of the source the text came from (usually a file path), as given to parseQasm. */
  readonly source: string;
  /** 1-based line of the offending token. */
  readonly line: number;
  /** 1-based column (in UTF-16 code units) of the offending token. */
  readonly column: number;
  /** What the reader would have accepted at this position, e.g. "';' after gate call". */
  readonly expected: string;

  /** `detail` is the message after the position; it usually starts with "expected …". */
  constructor(source: string, line: number, column: number, expected: string, detail: string) {
    super(`${source}:${line}:${column}: ${detail}`);
    this.source = source;
    this.line = line;
    this.column = column;
    this.expected = expected;
  }
}

/** True when `error` is a QasmParseError. */
export function isQasmParseError(error: unknown): error is QasmParseError {
  return error instanceof QasmParseError;
}
