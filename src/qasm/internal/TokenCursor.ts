// TokenCursor: walks a token list for the recursive-descent parsers, with expectation helpers that
// fail with "expected X, found Y" at the current token.
import type { Token } from './lexer.js';
import { fail, type Position } from './problem.js';

/** How a token is named in messages: 'h', ';', end of input, or the lexer's complaint. */
export function describeToken(token: Token): string {
  if (token.kind === 'end') return 'end of input';
  if (token.kind === 'string') return `string ${JSON.stringify(token.text)}`;
  return `'${token.text}'`;
}

export class TokenCursor {
  private index = 0;

  constructor(private readonly tokens: readonly Token[]) {}

  /** The current token (never past the final 'end' or 'invalid' token). */
  get current(): Token {
    return this.tokens[this.index] as Token;
  }

  /** The token `offset` places ahead, clamped to the last token. */
  peek(offset: number): Token {
    return this.tokens[Math.min(this.index + offset, this.tokens.length - 1)] as Token;
  }

  get position(): Position {
    return this.current;
  }

  /** Moves past the current token and returns it; fails on an invalid token. */
  next(): Token {
    const token = this.current;
    this.checkValid(token);
    if (token.kind !== 'end') this.index++;
    return token;
  }

  /** True when the current token is the punctuation or identifier `text`. */
  is(text: string): boolean {
    const token = this.current;
    return (token.kind === 'punctuation' || token.kind === 'identifier') && token.text === text;
  }

  /** Consumes `text` when it is current. */
  accept(text: string): boolean {
    if (!this.is(text)) return false;
    this.next();
    return true;
  }

  /** Consumes `text` or fails with "expected '<text>' <context>". */
  expect(text: string, context: string): Token {
    if (!this.is(text)) this.failHere(`'${text}' ${context}`);
    return this.next();
  }

  /** Consumes an identifier or fails with "expected <what>". */
  expectIdentifier(what: string): Token {
    if (this.current.kind !== 'identifier') this.failHere(what);
    return this.next();
  }

  /** Fails at the current token with "expected <expected>, found <token>". */
  failHere(expected: string): never {
    const token = this.current;
    this.checkValid(token);
    return fail(token, expected, `expected ${expected}, found ${describeToken(token)}`);
  }

  private checkValid(token: Token): void {
    if (token.kind === 'invalid') fail(token, 'a token of the supported OpenQASM 3 subset', token.problem ?? 'invalid input');
  }
}
