// Recursive-descent parser for angle expressions: + − (left-assoc) < * / (left-assoc) < unary ± <
// ** (right-assoc, binds tighter than unary minus as in OpenQASM 3) < literals, names, f(x), (x).
import type { Expr } from './syntax.js';
import type { TokenCursor } from './TokenCursor.js';
import { fail, type Position } from './problem.js';

/** Deepest nesting of parentheses, unary signs, ** and function calls the reader accepts. */
export const MAX_EXPRESSION_NESTING = 200;
/** Tallest expression tree the reader accepts (long flat sums count one level per term). */
export const MAX_EXPRESSION_DEPTH = 2000;

export const FUNCTIONS = new Set(['sin', 'cos', 'tan', 'arcsin', 'arccos', 'arctan', 'exp', 'log', 'sqrt']);

type ExprBody = Expr extends infer E ? (E extends unknown ? Omit<E, 'position' | 'depth'> : never) : never;

function node(body: ExprBody, position: Position, children: readonly Expr[]): Expr {
  const depth = 1 + children.reduce((d, c) => Math.max(d, c.depth), 0);
  if (depth > MAX_EXPRESSION_DEPTH) {
    fail(position, `an expression at most ${MAX_EXPRESSION_DEPTH} levels deep`, `expression nested more than ${MAX_EXPRESSION_DEPTH} levels deep`);
  }
  return { ...body, position, depth } as Expr;
}

class ExpressionParser {
  private nesting = 0;

  constructor(private readonly cursor: TokenCursor) {}

  expression(): Expr {
    this.enter();
    let left = this.multiplicative();
    while (this.cursor.is('+') || this.cursor.is('-')) {
      const op = this.cursor.next();
      const right = this.multiplicative();
      left = node({ kind: 'binary', op: op.text as '+' | '-', left, right }, op, [left, right]);
    }
    this.nesting--;
    return left;
  }

  private multiplicative(): Expr {
    let left = this.unary();
    while (this.cursor.is('*') || this.cursor.is('/')) {
      const op = this.cursor.next();
      const right = this.unary();
      left = node({ kind: 'binary', op: op.text as '*' | '/', left, right }, op, [left, right]);
    }
    return left;
  }

  private unary(): Expr {
    if (this.cursor.is('-') || this.cursor.is('+')) {
      const op = this.cursor.next();
      this.enter();
      const arg = this.unary();
      this.nesting--;
      return node({ kind: 'unary', op: op.text as '-' | '+', arg }, op, [arg]);
    }
    return this.power();
  }

  private power(): Expr {
    const base = this.primary();
    if (!this.cursor.is('**')) return base;
    const op = this.cursor.next();
    this.enter();
    const exponent = this.unary();
    this.nesting--;
    return node({ kind: 'binary', op: '**', left: base, right: exponent }, op, [base, exponent]);
  }

  private primary(): Expr {
    const token = this.cursor.current;
    if (token.kind === 'integer' || token.kind === 'float') {
      this.cursor.next();
      return node({ kind: 'number', value: Number(token.text) }, token, []);
    }
    if (token.kind === 'identifier') {
      this.cursor.next();
      if (!this.cursor.is('(')) return node({ kind: 'name', name: token.text }, token, []);
      if (!FUNCTIONS.has(token.text)) {
        fail(token, 'one of the functions ' + [...FUNCTIONS].join(', '), `unknown function '${token.text}'`);
      }
      this.cursor.next();
      const arg = this.expression();
      this.cursor.expect(')', `after the argument of ${token.text}`);
      return node({ kind: 'call', fn: token.text, arg }, token, [arg]);
    }
    if (this.cursor.accept('(')) {
      const inner = this.expression();
      this.cursor.expect(')', 'to close the parenthesis');
      return inner;
    }
    return this.cursor.failHere('a number, a name or \'(\' in an expression');
  }

  private enter(): void {
    this.nesting++;
    if (this.nesting > MAX_EXPRESSION_NESTING) {
      fail(this.cursor.position, `an expression nested at most ${MAX_EXPRESSION_NESTING} levels deep`, `expression nested more than ${MAX_EXPRESSION_NESTING} levels deep`);
    }
  }
}

/** Parses one expression at the cursor. */
export function parseExpression(cursor: TokenCursor): Expr {
  return new ExpressionParser(cursor).expression();
}
