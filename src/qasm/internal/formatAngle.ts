// Angle printer for the writer: numbers in JavaScript's shortest round-trip form (−0 kept), expression
// trees with just enough parentheses to parse back to the same tree; negated operands always bracketed.
import type { Angle } from '../../circuit/angle.js';

const ATOM = 5;
const POWER = 4;
const UNARY = 3;
const PRODUCT = 2;
const SUM = 1;

interface Printed {
  readonly text: string;
  readonly precedence: number;
}

/** A finite number as text that Number() reads back bit-exactly; throws RangeError for NaN/±Infinity. */
export function formatNumber(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError(`writeQasm: ${x} cannot be written as an OpenQASM number`);
  return Object.is(x, -0) ? '-0' : String(x);
}

function wrap(printed: Printed, bare: (precedence: number) => boolean): string {
  return bare(printed.precedence) ? printed.text : `(${printed.text})`;
}

function print(angle: Angle, params: readonly string[]): Printed {
  if (typeof angle === 'number') {
    const text = formatNumber(angle);
    return { text, precedence: text.startsWith('-') ? UNARY : ATOM };
  }
  switch (angle.op) {
    case 'param': {
      const name = params[angle.index];
      if (name === undefined) throw new RangeError(`writeQasm: angle refers to unbound parameter ${angle.index}`);
      return { text: name, precedence: ATOM };
    }
    case 'neg':
      // -(x ** y) needs no brackets: ** binds tighter than unary minus.
      return { text: `-${wrap(print(angle.arg, params), (p) => p >= POWER)}`, precedence: UNARY };
    case 'call':
      return { text: `${angle.fn}(${print(angle.arg, params).text})`, precedence: ATOM };
    case 'pow': {
      const left = wrap(print(angle.left, params), (p) => p === ATOM);
      const right = wrap(print(angle.right, params), (p) => p >= POWER);
      return { text: `${left} ** ${right}`, precedence: POWER };
    }
    default: {
      const level = angle.op === 'add' || angle.op === 'sub' ? SUM : PRODUCT;
      const symbol = { add: '+', sub: '-', mul: '*', div: '/' }[angle.op];
      // Left-associative: a same-level left operand needs no brackets, a same-level right one does
      // (floating-point + and * are not associative). Unary operands are always bracketed.
      const left = wrap(print(angle.left, params), (p) => p >= level && p !== UNARY);
      const right = wrap(print(angle.right, params), (p) => p > level && p !== UNARY);
      return { text: `${left} ${symbol} ${right}`, precedence: level };
    }
  }
}

/** OpenQASM text of `angle`; `params` names the enclosing gate's parameters by index. */
export function formatAngle(angle: Angle, params: readonly string[] = []): string {
  return print(angle, params).text;
}
