// parseQasm limits: gate definitions nested deeper than MAX_GATE_NESTING (256) and pow exponents of
// magnitude above 2^53 (or non-finite) are QasmParseErrors naming the line; within the limits,
// deep definitions read and simulate correctly.
import { describe, expect, it } from 'vitest';
import { MAX_GATE_NESTING } from '../../src/qasm/internal/buildCircuit.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { QasmParseError } from '../../src/qasm/QasmParseError.js';
import { outcomeDistribution } from '../../src/sim/outcomeDistribution.js';

const HEADER = ['OPENQASM 3;', 'include "stdgates.inc";', 'gate g0 a { x a; }'];

/** g0 = x; g_k = g_{k−1} (once, or twice when `doubling`); then g_levels on q[0] and a measurement. */
function nested(levels: number, doubling: boolean): string {
  const lines = [...HEADER];
  for (let k = 1; k <= levels; k++) lines.push(`gate g${k} a { g${k - 1} a;${doubling ? ` g${k - 1} a;` : ''} }`);
  lines.push('qubit[1] q;', 'bit[1] c;', `g${levels} q[0];`, 'c[0] = measure q[0];');
  return lines.join('\n') + '\n';
}

function parseError(text: string): QasmParseError {
  try {
    parseQasm(text, 'deep.qasm');
  } catch (error) {
    expect(error).toBeInstanceOf(QasmParseError);
    return error as QasmParseError;
  }
  return expect.fail('expected a QasmParseError');
}

describe('parseQasm nesting limit', () => {
  for (const levels of [300, 5000]) {
    for (const doubling of [false, true]) {
      it(`refuses ${levels} nested definitions (${doubling ? 'each calling the previous twice' : 'a chain'}) at the first too-deep line`, () => {
        const error = parseError(nested(levels, doubling));
        // g0 is depth 1 on line 3, so g256 (depth 257) is defined on line 259.
        expect(error.line).toBe(HEADER.length + MAX_GATE_NESTING);
        expect(error.message).toMatch(/nests gate definitions 257 levels deep; at most 256/);
      });
    }
  }

  it('reads a chain of 255 nested definitions (depth 256) and simulates it: one x, outcome 1', () => {
    const circuit = parseQasm(nested(MAX_GATE_NESTING - 1, false), 'deep.qasm');
    expect([...outcomeDistribution(circuit).outcomes]).toEqual([['1', 1]]);
  });
});

describe('parseQasm pow limits', () => {
  const program = (modifier: string): string => `OPENQASM 3;\ninclude "stdgates.inc";\nqubit[1] q;\n${modifier} @ h q[0];\n`;

  it('refuses pow(-1e308), pow(1e16) and pow(2^60) with the exponent position', () => {
    for (const exponent of ['-1e308', '1e16', '2**60']) {
      const error = parseError(program(`pow(${exponent})`));
      expect(error.line).toBe(4);
      expect(error.column).toBeGreaterThanOrEqual(5);
      expect(error.message).toMatch(/magnitude at most 2\^53/);
    }
  });

  it('refuses non-finite exponents and a combined power above 2^53', () => {
    expect(parseError(program('pow(1e400)')).message).toMatch(/finite/);
    const combined = parseError(program('pow(2**30) @ pow(2**30)'));
    expect(combined.line).toBe(4);
    expect(combined.message).toMatch(/combined power/);
  });

  it('accepts pow(2^53) and pow(-(2^40) - 1): h to an even power is I, to an odd power is h', () => {
    const measured = (modifier: string): [string, number][] =>
      [...outcomeDistribution(parseQasm(program(modifier) + 'bit[1] c;\nc[0] = measure q[0];\n', 'p.qasm')).outcomes];
    // h² = I (Nielsen & Chuang §4.2, from memory): even powers leave |0>.
    expect(measured('pow(2**53)')).toEqual([['0', 1]]);
    const odd = measured('pow(-(2**40) - 1)');
    expect(odd.map(([key]) => key)).toEqual(['0', '1']);
    odd.forEach(([, p]) => expect(Math.abs(p - 0.5)).toBeLessThan(1e-15));
  });
});
