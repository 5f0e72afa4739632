// `polewright run`: JSON shape and outcome key order (two registers, little-endian concatenation),
// the table, seeded shots, and exit code 2 with a one-line message (no stack trace) on bad input.
import { execFile } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { buildProgram } from '../../src/cli/program.js';
import { InputError } from '../../src/core/InputError.js';

const run = promisify(execFile);
const dir = mkdtempSync(join(tmpdir(), 'polewright-run-'));

function file(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

// q[0] → a[0], q[1] → b[1]; b[0] is never measured. Bell pair: q0 = q1.
const TWO_REGISTERS = file(
  'two.qasm',
  `OPENQASM 3.0;
include "stdgates.inc";
qubit[2] q;
bit[1] a;
bit[2] b;
h q[0];
cx q[0], q[1];
a[0] = measure q[0];
b[1] = measure q[1];
`,
);

/** Outcome keys in the order printed (JSON.parse would move integer-like keys such as "101" first). */
function printedKeys(text: string): string[] {
  return [...text.matchAll(/^ {4}"([01]*)":/gm)].map((m) => m[1]!);
}

async function output(...args: string[]): Promise<string> {
  let text = '';
  const spy = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    text += String(chunk);
    return true;
  });
  try {
    await buildProgram().parseAsync(['node', 'polewright', 'run', ...args]);
  } finally {
    spy.mockRestore();
  }
  return text;
}

afterEach(() => vi.restoreAllMocks());

describe('polewright run FILE --json', () => {
  it('prints { qubits, outcomes } with a[0] as bit 0, b[0] as bit 1, b[1] as bit 2, most significant first', async () => {
    const text = await output(TWO_REGISTERS, '--json');
    const parsed = JSON.parse(text) as { qubits: number; outcomes: Record<string, number> };
    expect(Object.keys(parsed)).toEqual(['qubits', 'outcomes']);
    expect(parsed.qubits).toBe(2);
    // Both qubits 0: "000"; both 1: a[0] = 1 (bit 0) and b[1] = 1 (bit 2): "101".
    expect(printedKeys(text)).toEqual(['000', '101']);
    expect(Object.keys(parsed.outcomes).sort()).toEqual(['000', '101']);
    expect(Math.abs(parsed.outcomes['000']! - 0.5)).toBeLessThan(1e-15);
    expect(Math.abs(parsed.outcomes['101']! - 0.5)).toBeLessThan(1e-15);
  });

  it('keeps keys in bitstring order even where JavaScript would put integer-like keys first', async () => {
    const path = file('order.qasm', 'OPENQASM 3.0;\ninclude "stdgates.inc";\nqubit[2] q;\nbit[2] c;\nh q[0];\nh q[1];\nc[0] = measure q[0];\nc[1] = measure q[1];\n');
    expect(printedKeys(await output(path, '--json'))).toEqual(['00', '01', '10', '11']);
  });

  it('prints integer counts with --shots, identical for the same --seed', async () => {
    const text = await output(TWO_REGISTERS, '--json', '--shots', '500', '--seed', '5');
    expect(await output(TWO_REGISTERS, '--json', '--shots', '500', '--seed', '5')).toBe(text);
    const first = JSON.parse(text) as { outcomes: Record<string, number> };
    expect(printedKeys(text)).toEqual(['000', '101']);
    expect(Number.isInteger(first.outcomes['000'])).toBe(true);
    expect(first.outcomes['000']! + first.outcomes['101']!).toBe(500);
  });
});

describe('polewright run FILE (table)', () => {
  it('lists the bit layout and one row per outcome sorted by bitstring', async () => {
    const lines = (await output(TWO_REGISTERS)).trim().split('\n');
    expect(lines[1]).toBe('bits, left to right: b[1] b[0] a[0]');
    expect(lines[2]).toMatch(/^outcome\s+probability$/);
    expect(lines.slice(3).map((l) => l.split(/\s+/)[0])).toEqual(['000', '101']);
  });

  it('throws InputErrors naming the missing file or the bad option', async () => {
    await expect(output(join(dir, 'absent.qasm'))).rejects.toThrow(InputError);
    await expect(output(join(dir, 'absent.qasm'))).rejects.toThrow(/absent\.qasm/);
    await expect(output(TWO_REGISTERS, '--shots', '-3')).rejects.toThrow(/--shots/);
    await expect(output(TWO_REGISTERS, '--seed', '1.5')).rejects.toThrow(/--seed/);
  });
});

describe('polewright run exit codes', () => {
  const main = join(import.meta.dirname, '../../src/cli/main.ts');
  async function exit(...args: string[]): Promise<{ code: number; stderr: string }> {
    try {
      // A small memory limit keeps any accidental allocation small (the refusals below come before it).
      await run(process.execPath, ['--import', 'tsx', main, 'run', ...args], { env: { ...process.env, POLEWRIGHT_MEMORY_LIMIT: String(64 * 2 ** 20) } });
      return { code: 0, stderr: '' };
    } catch (error) {
      const e = error as { code: number; stderr: string };
      return { code: e.code, stderr: e.stderr };
    }
  }

  it('exits 2 with one message line and no stack trace for a parse error and a bad --shots', async () => {
    const bad = file('bad.qasm', 'OPENQASM 3.0;\nqubit[1] q;\nh q[0]\n');
    const [parse, shots] = await Promise.all([exit(bad), exit(TWO_REGISTERS, '--shots', 'many')]);
    expect(parse.code).toBe(2);
    expect(parse.stderr).toMatch(/bad\.qasm:\d+:\d+:/);
    expect(parse.stderr).not.toMatch(/\n\s+at /);
    expect(parse.stderr.trim().split('\n')).toHaveLength(1);
    expect(shots.code).toBe(2);
    expect(shots.stderr).toMatch(/--shots/);
  }, 30000);

  it('exits 2 naming the line for deep gate nesting, an absurd pow, too many gates and too many measurement branches', async () => {
    const lines = (...body: string[]): string => ['OPENQASM 3;', 'include "stdgates.inc";', ...body].join('\n') + '\n';
    const chain = (levels: number, calls: number): string[] =>
      Array.from({ length: levels }, (_, k) => `gate g${k + 1} a { ${Array.from({ length: calls }, () => `g${k} a;`).join(' ')} }`);
    const deep = file('deep.qasm', lines('gate g0 a { x a; }', ...chain(300, 1), 'qubit q;', 'g300 q;'));
    const huge = file('huge.qasm', lines('gate g0 a { x a; }', ...chain(40, 2), 'qubit q;', 'g40 q;'));
    const power = file('power.qasm', lines('qubit[1] q;', 'pow(-1e308) @ h q[0];'));
    const branches = file('branches.qasm', lines('qubit[20] q;', 'bit[20] c;', 'h q;', ...Array.from({ length: 20 }, (_, k) => `c[${k}] = measure q[${k}]; reset q[${k}];`)));
    const results = await Promise.all([exit(deep), exit(huge), exit(power), exit(branches)]);
    results.forEach((r) => {
      expect(r.code).toBe(2);
      expect(r.stderr.trim().split('\n')).toHaveLength(1);
    });
    const [d, h, p, b] = results.map((r) => r.stderr);
    expect(d).toMatch(/deep\.qasm:259:\d+: gate 'g256' nests gate definitions 257 levels deep/);
    expect(h).toMatch(/huge\.qasm: the program expands to 1\.10e\+12 gates; run simulates at most 2\^30/);
    expect(p).toMatch(/power\.qasm:4:\d+: the exponent of pow must have magnitude at most 2\^53/);
    expect(b).toMatch(/2\^20 branches.*--shots/);
  }, 60000);
});

describe('polewright run and OpenQASM 3.0.0 phases', () => {
  it('h; ctrl @ U(2π, 0, 0); h gives 0 with certainty (U(2π, 0, 0) = I in 3.0.0, "Built-in gates")', async () => {
    const program = file('ctrl-u.qasm', 'OPENQASM 3;\ninclude "stdgates.inc";\nqubit[2] q;\nbit[1] c;\nh q[0];\nctrl @ U(2*pi,0,0) q[0],q[1];\nh q[0];\nc[0] = measure q[0];\n');
    expect(printedKeys(await output(program, '--json'))).toEqual(['0']);
  });
});
