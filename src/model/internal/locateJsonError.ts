// locateJsonError: finds where and why a text is not valid JSON (RFC 8259), since JSON.parse messages
// do not reliably carry a position.

export interface JsonErrorLocation {
  /** 1-based line and column of the offending character (or of the end of the text). */
  readonly line: number;
  readonly column: number;
  readonly reason: string;
}

class Syntax extends Error {
  constructor(readonly offset: number, readonly reason: string) {
    super(reason);
  }
}

/** Returns the first syntax error of `text`, or undefined when it is valid JSON. */
export function locateJsonError(text: string): JsonErrorLocation | undefined {
  try {
    const at = skipSpace(text, value(text, skipSpace(text, 0)));
    if (at < text.length) throw new Syntax(at, 'unexpected text after the JSON value');
    return undefined;
  } catch (error) {
    if (!(error instanceof Syntax)) throw error;
    const before = text.slice(0, error.offset);
    const line = before.split('\n').length;
    const column = error.offset - (before.lastIndexOf('\n') + 1) + 1;
    return { line, column, reason: error.reason };
  }
}

function skipSpace(text: string, at: number): number {
  while (at < text.length && ' \t\n\r'.includes(text[at]!)) at++;
  return at;
}

function describe(text: string, at: number): string {
  return at >= text.length ? 'end of input' : JSON.stringify(text[at]);
}

/** Deepest nesting of arrays and objects followed; deeper text is reported rather than overflowing the stack. */
export const DEEPEST_NESTING = 1000;

function value(text: string, at: number, depth = 0): number {
  const c = text[at];
  if ((c === '{' || c === '[') && depth >= DEEPEST_NESTING) throw new Syntax(at, `arrays and objects nested deeper than ${DEEPEST_NESTING} levels`);
  if (c === '{') return container(text, at, '}', true, depth + 1);
  if (c === '[') return container(text, at, ']', false, depth + 1);
  if (c === '"') return string(text, at);
  if (c === '-' || (c !== undefined && c >= '0' && c <= '9')) return number(text, at);
  for (const word of ['true', 'false', 'null']) if (text.startsWith(word, at)) return at + word.length;
  throw new Syntax(at, `expected a value, found ${describe(text, at)}`);
}

function container(text: string, at: number, close: string, isObject: boolean, depth: number): number {
  at = skipSpace(text, at + 1);
  if (text[at] === close) return at + 1;
  for (;;) {
    if (isObject) {
      if (text[at] !== '"') throw new Syntax(at, `expected a double-quoted key, found ${describe(text, at)}`);
      at = skipSpace(text, string(text, at));
      if (text[at] !== ':') throw new Syntax(at, `expected ':' after the key, found ${describe(text, at)}`);
      at = skipSpace(text, at + 1);
    }
    at = skipSpace(text, value(text, at, depth));
    if (text[at] === close) return at + 1;
    if (text[at] !== ',') throw new Syntax(at, `expected ',' or '${close}', found ${describe(text, at)}`);
    at = skipSpace(text, at + 1);
  }
}

function string(text: string, at: number): number {
  for (at++; at < text.length; at++) {
    const c = text[at]!;
    if (c === '"') return at + 1;
    if (c < ' ') throw new Syntax(at, 'control character inside a string');
    if (c === '\\') {
      const e = text[at + 1];
      if (e !== undefined && '"\\/bfnrt'.includes(e)) at++;
      else if (e === 'u' && /^[0-9a-fA-F]{4}$/.test(text.slice(at + 2, at + 6))) at += 5;
      else throw new Syntax(at, 'invalid escape in a string');
    }
  }
  throw new Syntax(at, 'unterminated string');
}

function number(text: string, at: number): number {
  const match = /^-?(0|[1-9][0-9]*)(\.[0-9]+)?([eE][+-]?[0-9]+)?/.exec(text.slice(at, at + 400));
  if (match === null) throw new Syntax(at, 'malformed number');
  return at + match[0].length;
}
