// Turns a parsed expression into an IR Angle: constant sub-expressions fold to numbers (with the same
// floating-point operations evaluateAngle uses), references to gate parameters become AngleExpr nodes.
import type { Angle, AngleFunction } from '../../circuit/angle.js';
import { ANGLE_FUNCTIONS } from '../../circuit/angle.js';
import type { Expr } from './syntax.js';
import { fail } from './problem.js';

const CONSTANTS: ReadonlyMap<string, number> = new Map([
  ['pi', Math.PI],
  ['π', Math.PI],
  ['tau', 2 * Math.PI],
  ['τ', 2 * Math.PI],
  ['euler', Math.E],
  ['ℇ', Math.E],
]);

const BINARY = { '+': 'add', '-': 'sub', '*': 'mul', '/': 'div', '**': 'pow' } as const;

function fold(op: keyof typeof BINARY, left: number, right: number): number {
  switch (op) {
    case '+':
      return left + right;
    case '-':
      return left - right;
    case '*':
      return left * right;
    case '/':
      return left / right;
    case '**':
      return left ** right;
  }
}

/** The Angle of `expr`; `params` maps gate parameter names to their indices (empty outside gate bodies). */
export function expressionToAngle(expr: Expr, params: ReadonlyMap<string, number>): Angle {
  switch (expr.kind) {
    case 'number':
      return expr.value;
    case 'name': {
      const index = params.get(expr.name);
      if (index !== undefined) return { op: 'param', index };
      const constant = CONSTANTS.get(expr.name);
      if (constant !== undefined) return constant;
      const known = params.size > 0 ? `a parameter (${[...params.keys()].join(', ')}) or a constant` : 'a number or a constant (pi, tau, euler)';
      return fail(expr.position, known, `unknown identifier '${expr.name}' in an expression: expected ${known}`);
    }
    case 'unary': {
      const arg = expressionToAngle(expr.arg, params);
      if (expr.op === '+') return arg;
      return typeof arg === 'number' ? -arg : { op: 'neg', arg };
    }
    case 'binary': {
      const left = expressionToAngle(expr.left, params);
      const right = expressionToAngle(expr.right, params);
      if (typeof left === 'number' && typeof right === 'number') return fold(expr.op, left, right);
      return { op: BINARY[expr.op], left, right };
    }
    case 'call': {
      const fn = expr.fn as AngleFunction;
      const arg = expressionToAngle(expr.arg, params);
      return typeof arg === 'number' ? ANGLE_FUNCTIONS[fn](arg) : { op: 'call', fn, arg };
    }
  }
}

/**
 * The value of a constant expression, which must be a finite number; `params` are the gate
 * parameters in scope, named in the message when the expression depends on them.
 */
export function constantValue(expr: Expr, what: string, params: ReadonlyMap<string, number> = new Map()): number {
  const value = expressionToAngle(expr, params);
  if (typeof value !== 'number') {
    return fail(expr.position, `${what} as a constant`, `expected ${what} to be a constant, but it depends on gate parameters`);
  }
  if (!Number.isFinite(value)) {
    return fail(expr.position, `${what} as a finite number`, `expected ${what} to be a finite number, got ${value}`);
  }
  return value;
}

/** The value of a constant expression, which must be an integer within [min, max]. */
export function integerValue(expr: Expr, what: string, min: number, max: number, params: ReadonlyMap<string, number> = new Map()): number {
  const value = constantValue(expr, what, params);
  if (!Number.isInteger(value) || value < min || value > max) {
    return fail(expr.position, `${what}: an integer from ${min} to ${max}`, `expected ${what} to be an integer from ${min} to ${max}, got ${value}`);
  }
  return value;
}
