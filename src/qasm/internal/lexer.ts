// Lexer for the OpenQASM 3 subset: turns source text into tokens with 1-based line/column, skipping
// comments but remembering an own-line `//` comment directly above a token (used for gate roles).
import type { Position } from './problem.js';

export type TokenKind = 'identifier' | 'integer' | 'float' | 'string' | 'punctuation' | 'invalid' | 'end';

export interface Token extends Position {
  readonly kind: TokenKind;
  /** Source text (for strings: the contents without quotes; for invalid: the offending text). */
  readonly text: string;
  /** Own-line `//` comment on the line just above this token, trimmed. */
  readonly comment?: string;
  /** For invalid tokens: what is wrong. */
  readonly problem?: string;
}

const PUNCTUATION = ['**', '->', ';', ',', '(', ')', '[', ']', '{', '}', '@', '=', '+', '-', '*', '/', ':'];
const NUMBER = /(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?/y;
const IDENTIFIER = /[A-Za-z_][A-Za-z0-9_]*/y;
const CONSTANT_SYMBOLS = new Set(['π', 'τ', 'ℇ']);

interface Comment {
  readonly line: number;
  readonly text: string;
}

/** All tokens of `text`, ending with one 'end' token, or with an 'invalid' token where lexing stopped. */
export function tokenize(text: string): Token[] {
  const tokens: Token[] = [];
  let index = 0;
  let line = 1;
  let lineStart = 0;
  let lastTokenLine = 0;
  let comment: Comment | undefined;

  const advanceOver = (end: number): void => {
    for (let k = index; k < end; k++) {
      if (text.charCodeAt(k) === 10) {
        line++;
        lineStart = k + 1;
      }
    }
    index = end;
  };
  const push = (kind: TokenKind, tokenText: string, extra: { problem?: string } = {}): void => {
    const column = index - lineStart + 1;
    const above = comment !== undefined && comment.line === line - 1 ? { comment: comment.text } : {};
    tokens.push({ kind, text: tokenText, line, column, ...above, ...extra });
    comment = undefined;
    lastTokenLine = line;
  };

  while (index < text.length) {
    const ch = text[index] as string;
    if (ch === ' ' || ch === '\t' || ch === '\r' || ch === '\n' || ch === '\f' || ch === '\v') {
      advanceOver(index + 1);
      continue;
    }
    if (text.startsWith('//', index)) {
      const end = text.indexOf('\n', index);
      const stop = end < 0 ? text.length : end;
      comment = lastTokenLine < line ? { line, text: text.slice(index + 2, stop).trim() } : undefined;
      advanceOver(stop);
      continue;
    }
    if (text.startsWith('/*', index)) {
      const end = text.indexOf('*/', index + 2);
      if (end < 0) {
        push('invalid', '/*', { problem: 'unterminated block comment' });
        return tokens;
      }
      comment = undefined;
      advanceOver(end + 2);
      continue;
    }
    NUMBER.lastIndex = index;
    const number = NUMBER.exec(text);
    if (number) {
      const value = number[0];
      push(/^\d+$/.test(value) ? 'integer' : 'float', value);
      advanceOver(index + value.length);
      continue;
    }
    IDENTIFIER.lastIndex = index;
    const identifier = IDENTIFIER.exec(text);
    if (identifier) {
      push('identifier', identifier[0]);
      advanceOver(index + identifier[0].length);
      continue;
    }
    if (CONSTANT_SYMBOLS.has(ch)) {
      push('identifier', ch);
      advanceOver(index + 1);
      continue;
    }
    if (ch === '"' || ch === "'") {
      const end = text.indexOf(ch, index + 1);
      const newline = text.indexOf('\n', index + 1);
      if (end < 0 || (newline >= 0 && newline < end)) {
        push('invalid', ch, { problem: 'unterminated string' });
        return tokens;
      }
      push('string', text.slice(index + 1, end));
      advanceOver(end + 1);
      continue;
    }
    const punctuation = PUNCTUATION.find((p) => text.startsWith(p, index));
    if (punctuation) {
      push('punctuation', punctuation);
      advanceOver(index + punctuation.length);
      continue;
    }
    const codePoint = String.fromCodePoint(text.codePointAt(index) as number);
    push('invalid', codePoint, { problem: `unexpected character ${JSON.stringify(codePoint)}` });
    return tokens;
  }
  push('end', '');
  return tokens;
}
