// parseQasm error reporting: specific malformed programs give a QasmParseError at the expected
// line:column with a message naming what was found and what was expected.
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/InputError.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { QasmParseError } from '../../src/qasm/QasmParseError.js';

const HEADER = 'OPENQASM 3.0;\ninclude "stdgates.inc";\n';

function errorOf(text: string): QasmParseError {
  try {
    parseQasm(text, 'bad.qasm');
  } catch (error) {
    if (error instanceof QasmParseError) return error;
    throw error;
  }
  throw new Error('expected a QasmParseError');
}

// [description, program, line, column, message after "bad.qasm:line:column: "]
const CASES: readonly (readonly [string, string, number, number, string])[] = [
  ['a missing semicolon', `${HEADER}qubit[2] q;\nh q[0] h q[1];`, 4, 8, "expected ';' after gate call, found 'h'"],
  ['an unknown gate', `${HEADER}qubit q;\nfoo q;`, 4, 1, "unknown gate 'foo'"],
  ['a missing parameter', `${HEADER}qubit q;\nrx q;`, 4, 1, "gate 'rx' takes 1 parameter, got 0"],
  ['too few qubits', `${HEADER}qubit[2] q;\ncx q[0];`, 4, 1, "gate 'cx' takes 2 qubits, got 1"],
  ['too few qubits for the controls', `${HEADER}qubit[2] q;\nctrl(2) @ x q[0], q[1];`, 4, 11, "gate 'x' with its controls takes 3 qubits, got 2"],
  ['an index out of range', `${HEADER}qubit[2] q;\nx q[2];`, 4, 5, "expected the index into 'q' to be an integer from 0 to 1, got 2"],
  ['a repeated qubit', `${HEADER}qubit[2] q;\ncx q[1], q[1];`, 4, 10, "repeated qubit operand 'q' in a call of 'cx'"],
  ['an undeclared register', `${HEADER}x r[0];`, 3, 3, "undeclared qubit register 'r'"],
  ['a duplicate declaration', `${HEADER}qubit q;\nbit q;`, 4, 5, "duplicate declaration of 'q'"],
  ['a register named like a standard gate', `${HEADER}qubit[2] cx;`, 3, 10, "duplicate declaration of 'cx'"],
  ['a non-integer power of a user gate', `${HEADER}gate g a { x a; }\nqubit q;\npow(0.5) @ g q;`, 5, 1, "pow of user-defined gate 'g' must be an integer, got 0.5"],
  ['a for loop', `${HEADER}qubit q;\nfor i in [0:2] { x q; }`, 4, 1, "unsupported statement 'for': expected a declaration, gate definition, gate call, measure, reset or barrier"],
  ['an OpenQASM 2 register', `${HEADER}qreg q[2];`, 3, 1, "OpenQASM 2 declaration 'qreg' is not supported; expected 'qubit[n] name;'"],
  ['another include', 'OPENQASM 3;\ninclude "qelib1.inc";', 2, 9, 'cannot include "qelib1.inc": only "stdgates.inc" is available'],
  ['a standard gate without the include', 'qubit q;\nh q;', 2, 1, 'gate \'h\' needs include "stdgates.inc"; before its first use'],
  ['an unterminated block comment', `${HEADER}qubit q; /* never closed`, 3, 10, 'unterminated block comment'],
  ['an unexpected character', `${HEADER}qubit q;\nx q; %`, 4, 6, 'unexpected character "%"'],
  ['an indexed operand in a gate body', `${HEADER}gate g a { x a[0]; }`, 3, 14, "gate bodies address qubits by parameter name; found 'a[…]'"],
  ['a measure in a gate body', `${HEADER}gate g a { measure a -> c; }`, 3, 12, "expected a gate call or '}' in the gate body, found 'measure'"],
  ['an initialised bit', `${HEADER}bit[2] c = 3;`, 3, 10, "expected ';' after the declaration, found '='"],
  ['a register slice', `${HEADER}qubit[3] q;\nh q[0:1];`, 4, 6, "expected ']' after the index, found ':'"],
  ['an unknown identifier in an angle', `${HEADER}qubit q;\nrz(theta) q;`, 4, 4, "unknown identifier 'theta' in an expression: expected a number or a constant (pi, tau, euler)"],
  ['a division by zero', `${HEADER}qubit q;\nrz(1/0) q;`, 4, 5, 'expected a finite angle, got Infinity'],
  ['pow over inv with a non-integer exponent', `${HEADER}qubit q;\npow(0.5) @ inv @ s q;`, 4, 1, "a non-integer pow(0.5) cannot be applied over inv or another pow of 's'; write 'inv @ pow(0.5) @ s' instead"],
  ['a late OPENQASM line', `include "stdgates.inc";\nOPENQASM 3;`, 2, 1, 'the OPENQASM version line must be the first statement'],
  ['an unclosed gate body', `${HEADER}gate g a { x a;`, 3, 16, "expected '}' to close the gate body, found end of input"],
  ['broadcast over unequal registers', `${HEADER}qubit[2] a;\nqubit[3] b;\ncx a, b;`, 5, 7, 'cannot broadcast over registers of sizes 2 and 3'],
  ['a register beyond the size limit', `${HEADER}qubit[100000] q;`, 3, 7, 'expected the register size to be an integer from 1 to 65536, got 100000'],
  ['a power that depends on a gate parameter', `${HEADER}gate g(k) a { pow(k) @ x a; }`, 3, 19, 'expected the exponent of pow to be a constant, but it depends on gate parameters'],
  ['a measure into a qubit register', `${HEADER}qubit[2] q;\nq[0] = measure q[1];`, 4, 1, "'q' is not a bit register"],
];

describe('parseQasm errors', () => {
  for (const [what, text, line, column, message] of CASES) {
    it(`reports ${what} at ${line}:${column}`, () => {
      const error = errorOf(text);
      expect(error).toBeInstanceOf(InputError);
      expect(error.name).toBe('QasmParseError');
      expect(error.message).toBe(`bad.qasm:${line}:${column}: ${message}`);
      expect([error.source, error.line, error.column]).toEqual(['bad.qasm', line, column]);
      expect(error.expected.length).toBeGreaterThan(0);
    });
  }

  it('refuses 100,000 nested parentheses with a QasmParseError', () => {
    const error = errorOf(`${HEADER}qubit q;\nrz(${'('.repeat(100_000)}1${')'.repeat(100_000)}) q;`);
    expect(error.message).toMatch(/nested more than 200 levels deep/);
  });

  it('refuses 100,000 nested unary minus signs with a QasmParseError', () => {
    expect(errorOf(`${HEADER}qubit q;\nrz(${'-'.repeat(100_000)}1) q;`).message).toMatch(/nested more than/);
  });
});
