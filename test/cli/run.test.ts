// `polewright run`: the register-by-register JSON layout (header, registers, outcomes sorted by value), the table,
// seeded shots, limits on file size, qubits and shots, and exit code 2 with a one-line message on bad input.
import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { MAX_QASM_FILE_BYTES } from '../../src/cli/commands/run.js';
import { MAX_SHOTS } from '../../src/cli/options.js';
import { buildProgram } from '../../src/cli/program.js';
import { InputError } from '../../src/core/InputError.js';
import { VERSION } from '../../src/core/version.js';
import { expectClose } from '../helpers/close.js';

const run = promisify(execFile);
const dir = mkdtempSync(join(tmpdir(), 'polewright-run-'));

function sha256(path: string): string {
  return createHash('sha256').update(readFileSync(path)).digest('hex');
}

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

interface RunJson {
  tool: string;
  version: string;
  command: string;
  inputs: { file: string; sha256: string; shots: number | null; seed: number | null };
  qubits: number;
  registers: string[];
  outcomes: { bits: Record<string, string>; probability?: number; count?: number }[];
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
  it('prints the header, qubits, registers in declaration order and each outcome register by register, bit 0 first', async () => {
    const parsed = JSON.parse(await output(TWO_REGISTERS, '--json')) as RunJson;
    expect(Object.keys(parsed)).toEqual(['tool', 'version', 'command', 'inputs', 'qubits', 'registers', 'outcomes']);
    expect([parsed.tool, parsed.command, parsed.version]).toEqual(['polewright', 'run', VERSION]);
    expect(parsed.inputs).toEqual({ file: TWO_REGISTERS, sha256: sha256(TWO_REGISTERS), shots: null, seed: null });
    expect(parsed.qubits).toBe(2);
    expect(parsed.registers).toEqual(['a', 'b']);
    // Both qubits 0: a = "0", b = "00"; both 1: a[0] = 1 and b[1] = 1 (b[0] is never measured), so b = "01".
    expect(parsed.outcomes.map((o) => o.bits)).toEqual([{ a: '0', b: '00' }, { a: '1', b: '01' }]);
    for (const o of parsed.outcomes) expectClose(o.probability!, 0.5, 1e-15);
  });

  it('sorts outcomes by probability, largest first, not by bitstring', async () => {
    // R_y(θ)|0> has P(1) = sin²(θ/2) (Nielsen & Chuang, §4.2): 3/4 for θ = 2π/3 on q[0], sin²(π/8) for θ = π/4 on q[1].
    const path = file('order.qasm', 'OPENQASM 3.0;\ninclude "stdgates.inc";\nqubit[2] q;\nbit[2] c;\nry(2*pi/3) q[0];\nry(pi/4) q[1];\nc[0] = measure q[0];\nc[1] = measure q[1];\n');
    const parsed = JSON.parse(await output(path, '--json')) as RunJson;
    const one = Math.sin(Math.PI / 8) ** 2;
    expect(parsed.outcomes.map((o) => o.bits.c)).toEqual(['10', '00', '11', '01']);
    const expected = [0.75 * (1 - one), 0.25 * (1 - one), 0.75 * one, 0.25 * one];
    parsed.outcomes.forEach((o, k) => expectClose(o.probability!, expected[k]!, 1e-14, `P(${o.bits.c})`));
  });

  it('prints integer "count"s with --shots summing to the shots, identical for the same --seed, and states shots and seed', async () => {
    const text = await output(TWO_REGISTERS, '--json', '--shots', '500', '--seed', '5');
    expect(await output(TWO_REGISTERS, '--json', '--shots', '500', '--seed', '5')).toBe(text);
    const parsed = JSON.parse(text) as RunJson;
    expect(parsed.inputs).toMatchObject({ shots: 500, seed: 5 });
    const counts = parsed.outcomes.map((o) => o.count!);
    expect(counts.every(Number.isInteger)).toBe(true);
    expect(counts[0]! + counts[1]!).toBe(500);
    expect(counts[0]).toBeGreaterThanOrEqual(counts[1]!);
    expect(parsed.outcomes.every((o) => o.probability === undefined)).toBe(true);
  });

  it('gives a program without classical bits one empty outcome of probability 1', async () => {
    const path = file('none.qasm', 'OPENQASM 3.0;\ninclude "stdgates.inc";\nqubit[1] q;\nh q[0];\n');
    const parsed = JSON.parse(await output(path, '--json')) as RunJson;
    expect(parsed.registers).toEqual([]);
    expect(parsed.outcomes.map((o) => o.bits)).toEqual([{}]);
    expectClose(parsed.outcomes[0]!.probability!, 1, 1e-15);
  });
});

describe('polewright run FILE (table)', () => {
  it('shows one column per register (bit 0 first, stated above) and one row per outcome', async () => {
    const lines = (await output(TWO_REGISTERS)).trim().split('\n');
    expect(lines[0]).toBe(`${TWO_REGISTERS}: 2 qubits, exact probabilities`);
    expect(lines[1]).toMatch(/one column per classical register, its bits written bit 0 first/);
    expect(lines[2]).toMatch(/^a\s+b\s+probability$/);
    expect(lines.slice(4).map((l) => l.split(/\s+/).slice(0, 2))).toEqual([['0', '00'], ['1', '01']]);
    const single = (await output(TWO_REGISTERS, '--shots', '1')).split('\n')[0];
    expect(single).toBe(`${TWO_REGISTERS}: 2 qubits, 1 shot, seed 1`);
  });

  it('throws InputErrors naming the missing file or the bad option and its range', async () => {
    await expect(output(join(dir, 'absent.qasm'))).rejects.toThrow(InputError);
    await expect(output(join(dir, 'absent.qasm'))).rejects.toThrow(/absent\.qasm/);
    await expect(output(TWO_REGISTERS, '--shots', '-3')).rejects.toThrow(`--shots must be a whole number from 1 to ${MAX_SHOTS}, got "-3"`);
    await expect(output(TWO_REGISTERS, '--shots', '0')).rejects.toThrow(`--shots must be a whole number from 1 to ${MAX_SHOTS}, got "0"`);
    await expect(output(TWO_REGISTERS, '--shots', '99999999999')).rejects.toThrow(/--shots must be a whole number from 1 to 1000000000/);
    await expect(output(TWO_REGISTERS, '--seed', '1.5')).rejects.toThrow(/--seed/);
    await expect(output(TWO_REGISTERS, '--seed', '4294967296')).rejects.toThrow(/--seed must be a whole number from 0 to 4294967295/);
  });

  it('refuses a program file over the size limit and an endless device before parsing, stating the limit', async () => {
    const big = file('big.qasm', 'OPENQASM 3.0;\n' + '// padding\n'.repeat(MAX_QASM_FILE_BYTES / 11 + 1));
    await expect(output(big)).rejects.toThrow(`${big}: the OpenQASM program is larger than 4.00 MiB, the most it may be`);
    await expect(output('/dev/zero')).rejects.toThrow(/^\/dev\/zero: the OpenQASM program is larger than 4\.00 MiB/);
  });

  it('refuses more qubits than the simulator holds, naming the file and the limit, not an internal name', async () => {
    const wide = file('wide.qasm', 'OPENQASM 3.0;\ninclude "stdgates.inc";\nqubit[31] q;\nh q[0];\n');
    await expect(output(wide)).rejects.toThrow(`${wide}: the program needs 31 qubits; the simulator holds at most 30 (a 30-qubit state takes 16.00 GiB)`);
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
    expect(h).toMatch(/huge\.qasm: the program expands to 1\.10e\+12 gates; run simulates at most 2\^24/);
    expect(p).toMatch(/power\.qasm:4:\d+: the exponent of pow must have magnitude at most 2\^53/);
    expect(b).toMatch(/2\^20 branches.*--shots/);
  }, 60000);

  it('refuses a program of 2^25 gates (just over MAX_RUN_GATES = 2^24) before simulating', async () => {
    const lines = ['OPENQASM 3;', 'include "stdgates.inc";', 'gate g0 a { x a; }'];
    for (let k = 1; k <= 25; k++) lines.push(`gate g${k} a { g${k - 1} a; g${k - 1} a; }`);
    const over = file('over.qasm', [...lines, 'qubit q;', 'g25 q;'].join('\n') + '\n');
    const result = await exit(over);
    expect(result.code).toBe(2);
    expect(result.stderr).toMatch(/over\.qasm: the program expands to 3\.36e\+7 gates; run simulates at most 2\^24 \(16777216\) gates/);
  });
});

describe('polewright run and OpenQASM 3.0.0 phases', () => {
  it('h; ctrl @ U(2π, 0, 0); h gives 0 with certainty (U(2π, 0, 0) = I in 3.0.0, "Built-in gates")', async () => {
    const program = file('ctrl-u.qasm', 'OPENQASM 3;\ninclude "stdgates.inc";\nqubit[2] q;\nbit[1] c;\nh q[0];\nctrl @ U(2*pi,0,0) q[0],q[1];\nh q[0];\nc[0] = measure q[0];\n');
    expect((JSON.parse(await output(program, '--json')) as RunJson).outcomes.map((o) => o.bits)).toEqual([{ c: '0' }]);
  });
});
