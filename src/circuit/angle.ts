/**
 * Angle expressions of the circuit IR: a number, or a small expression tree over a block's
 * parameters, so a parameterised block is stored once and evaluated per call.
 */

export type AngleFunction = 'sin' | 'cos' | 'tan' | 'arcsin' | 'arccos' | 'arctan' | 'exp' | 'log' | 'sqrt';

export type AngleExpr =
  | { readonly op: 'param'; readonly index: number }
  | { readonly op: 'neg'; readonly arg: Angle }
  | { readonly op: 'add' | 'sub' | 'mul' | 'div' | 'pow'; readonly left: Angle; readonly right: Angle }
  | { readonly op: 'call'; readonly fn: AngleFunction; readonly arg: Angle };

/** A numeric angle or an expression over the enclosing block's parameters. */
export type Angle = number | AngleExpr;

export const ANGLE_FUNCTIONS: Readonly<Record<AngleFunction, (x: number) => number>> = {
  sin: Math.sin,
  cos: Math.cos,
  tan: Math.tan,
  arcsin: Math.asin,
  arccos: Math.acos,
  arctan: Math.atan,
  exp: Math.exp,
  log: Math.log,
  sqrt: Math.sqrt,
};

/** Reference to parameter `index` of the enclosing block. */
export function param(index: number): AngleExpr {
  return { op: 'param', index };
}

/** Evaluates an angle with the given parameter values (numbers pass through unchanged). */
export function evaluateAngle(angle: Angle, params: readonly number[]): number {
  if (typeof angle === 'number') return angle;
  switch (angle.op) {
    case 'param': {
      const value = params[angle.index];
      if (value === undefined) throw new RangeError(`angle parameter ${angle.index} is not bound`);
      return value;
    }
    case 'neg':
      return -evaluateAngle(angle.arg, params);
    case 'add':
      return evaluateAngle(angle.left, params) + evaluateAngle(angle.right, params);
    case 'sub':
      return evaluateAngle(angle.left, params) - evaluateAngle(angle.right, params);
    case 'mul':
      return evaluateAngle(angle.left, params) * evaluateAngle(angle.right, params);
    case 'div':
      return evaluateAngle(angle.left, params) / evaluateAngle(angle.right, params);
    case 'pow':
      return evaluateAngle(angle.left, params) ** evaluateAngle(angle.right, params);
    case 'call':
      return ANGLE_FUNCTIONS[angle.fn](evaluateAngle(angle.arg, params));
  }
}

/** Largest parameter index referenced, or −1 when the angle is constant. */
export function maxParamIndex(angle: Angle): number {
  if (typeof angle === 'number') return -1;
  switch (angle.op) {
    case 'param':
      return angle.index;
    case 'neg':
    case 'call':
      return maxParamIndex(angle.arg);
    default:
      return Math.max(maxParamIndex(angle.left), maxParamIndex(angle.right));
  }
}
