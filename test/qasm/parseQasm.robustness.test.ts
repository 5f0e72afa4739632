// parseQasm robustness: thousands of mutated valid programs (tokens deleted, duplicated, swapped;
// random characters inserted or replaced; truncation) and random text each give a Circuit or a
// QasmParseError with a sane position — nothing else (timings: scripts/bench-robustness.ts).
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { QasmParseError } from '../../src/qasm/QasmParseError.js';

const file = (path: string): string => readFileSync(new URL(`../../circuits/${path}`, import.meta.url), 'utf8');

const SEEDS = [
  file('bell.qasm'),
  file('ghz.qasm'),
  file('teleport.qasm'),
  file('golden/basics.qasm'),
  file('golden/blocks.qasm'),
  file('golden/conjugated.qasm'),
  'OPENQASM 3;\ninclude "stdgates.inc";\nqubit[3] q;\nqubit a;\nbit[3] c;\n/* block */ h q;\ncx q[0], a;\n' +
    'gate g(t) x, y { ctrl @ rz(-t ** 2 / τ + sin(π)) x, y; negctrl(1) @ pow(2) @ s x, y; gphase(ℇ); }\n' +
    'inv @ pow(-3) @ g(1e-7) q[2], q[1];\nmeasure q[0] -> c[0];\nc = measure q; // done\nreset a;\nbarrier;\n',
];

/** Tokens with the whitespace and comments between them kept, so joining them restores the text. */
function pieces(text: string): string[] {
  return text.match(/\s+|\/\/[^\n]*|\/\*[\s\S]*?\*\/|[A-Za-z_]\w*|\d+\.?\d*(?:[eE][+-]?\d+)?|\.\d+|\*\*|->|"[^"]*"|[\s\S]/gu) ?? [];
}

type Mutation = (text: string) => string;

const atIndex = (f: (list: string[], k: number) => void): fc.Arbitrary<Mutation> =>
  fc.nat().map((k) => (text: string) => {
    const list = pieces(text);
    if (list.length > 0) f(list, k % list.length);
    return list.join('');
  });

const randomText = fc.string({ unit: fc.oneof(fc.constantFrom(...';,()[]{}@=-+*/:"\'π\n \u0000\uFFFF\uD800'), fc.string({ unit: 'binary', minLength: 1, maxLength: 1 })), minLength: 1, maxLength: 3 });

const MUTATIONS: fc.Arbitrary<Mutation> = fc.oneof(
  atIndex((list, k) => list.splice(k, 1)),
  atIndex((list, k) => list.splice(k, 0, list[k]!)),
  fc.tuple(fc.nat(), fc.nat()).map(([a, b]) => (text: string) => {
    const list = pieces(text);
    if (list.length === 0) return text;
    const i = a % list.length;
    const j = b % list.length;
    [list[i], list[j]] = [list[j]!, list[i]!];
    return list.join('');
  }),
  fc.tuple(fc.nat(), randomText).map(([p, s]) => (text: string) => text.slice(0, p % (text.length + 1)) + s + text.slice(p % (text.length + 1))),
  fc.tuple(fc.nat(), randomText).map(([p, s]) => (text: string) => text.slice(0, p % (text.length + 1)) + s + text.slice((p % (text.length + 1)) + 1)),
  fc.nat().map((p) => (text: string) => text.slice(0, p % (text.length + 1))),
);

const mutatedProgram = fc.tuple(fc.constantFrom(...SEEDS), fc.array(MUTATIONS, { minLength: 1, maxLength: 3 }))
  .map(([seed, mutations]) => mutations.reduce((text, m) => m(text), seed));

function expectCircuitOrParseError(text: string): void {
  let result: unknown;
  try {
    result = parseQasm(text, 'mutant.qasm');
  } catch (error) {
    expect(error).toBeInstanceOf(QasmParseError);
    const e = error as QasmParseError;
    expect(Number.isInteger(e.line) && e.line >= 1).toBe(true);
    expect(Number.isInteger(e.column) && e.column >= 1).toBe(true);
    expect(e.line).toBeLessThanOrEqual(text.split('\n').length);
    expect(e.message.startsWith(`mutant.qasm:${e.line}:${e.column}: `)).toBe(true);
    return;
  }
  expect(Array.isArray((result as { ops?: unknown }).ops)).toBe(true);
}

describe('parseQasm on malformed input', () => {
  it('reads every seed program without error', () => {
    for (const seed of SEEDS) expect(parseQasm(seed, 'seed.qasm').ops.length).toBeGreaterThan(0);
  });

  it('gives a Circuit or a QasmParseError for 2,500 mutated programs', () => {
    fc.assert(fc.property(mutatedProgram, expectCircuitOrParseError), { numRuns: 2500 });
  });

  it('gives a Circuit or a QasmParseError for 500 random strings', () => {
    fc.assert(fc.property(fc.string({ unit: 'binary', maxLength: 200 }), expectCircuitOrParseError), { numRuns: 500 });
  });
});
