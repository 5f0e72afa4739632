// `polewright verify` through the built entry: exit 0/1/2, the JSON report's shape, the text report, and bad input
// (wrong register, operator size, non-square matrix, Pauli index beyond the register, mid-circuit measurement).
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Command } from 'commander';
import { afterAll, describe, expect, it, vi } from 'vitest';
import { registerVerifyCommand } from '../../src/cli/commands/verify.js';
import { isInputError } from '../../src/core/InputError.js';
import { runCli } from '../helpers/runCli.js';

const fixture = (name: string) => fileURLToPath(new URL(`../fixtures/verify/${name}`, import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'verify-cli-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = (name: string, text: string) => {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
};

/** The command run in this process (spawning the entry costs seconds): exit 2 for an InputError, as main.ts maps it. */
async function runVerify(args: readonly string[]): Promise<{ status: number; stdout: string; stderr: string }> {
  const writes: string[] = [];
  const spy = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    writes.push(String(chunk));
    return true;
  });
  const program = new Command().exitOverride();
  registerVerifyCommand(program);
  process.exitCode = undefined;
  try {
    await program.parseAsync(['node', 'polewright', 'verify', ...args]);
    return { status: Number(process.exitCode ?? 0), stdout: writes.join(''), stderr: '' };
  } catch (error) {
    if (!isInputError(error)) throw error;
    return { status: 2, stdout: writes.join(''), stderr: error.message };
  } finally {
    spy.mockRestore();
    process.exitCode = undefined;
  }
}

describe('polewright verify CIRCUIT --encodes OPERATOR', () => {
  it('passes the hand-written LCU with exit 0 and prints the JSON report with α fitted to 4 (Childs & Wiebe 2012: α = Σ|c|)', () => {
    const result = runCli(['verify', fixture('lcu-two-paulis.qasm'), '--encodes', fixture('lcu-two-paulis.json'), '--json']);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(report).toMatchObject({ ok: true, alphaFitted: true, mode: 'exhaustive', worstColumn: expect.any(Number), clean: {}, operator: fixture('lcu-two-paulis.json') });
    expect(report.version).toMatch(/^\d+\.\d+\.\d+/);
    expect(Object.keys(report).slice(0, 5)).toEqual(['tool', 'version', 'command', 'inputs', 'ok']);
    expect(report).toMatchObject({ command: 'verify', inputs: { circuit: fixture('lcu-two-paulis.qasm'), probes: 8, seed: 1, tolerance: 1e-8, alpha: null } });
    expect(Math.abs(report.alpha - 4)).toBeLessThan(1e-12);
    expect(report.maxError).toBeLessThan(1e-12);
  });

  it('fails the mutated circuit with exit 1 and names the worst column in the text report', () => {
    const result = runCli(['verify', fixture('lcu-two-paulis.mutated.qasm'), '--encodes', fixture('lcu-two-paulis.json'), '--alpha', '4']);
    expect(result.status).toBe(1);
    // Worked out by hand beside test/verify/verifyCircuit.test.ts: error 0.5 first at column 2 = |10>.
    expect(result.stdout).toMatch(/max error +5\.00e-1/);
    expect(result.stdout).toMatch(/worst +column 2 = \|10>_q/);
    expect(result.stdout).toMatch(/result +FAIL/);
  });

  it('reports probe mode as a lower bound, and the clean-register leak', async () => {
    const result = await runVerify([fixture('ladder-annihilate-1.qasm'), '--encodes', fixture('ladder-annihilate-1.json'), '--probes', '3', '--seed', '9', '--tolerance', '1e-9']);
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/exhaustive: all 4 system basis columns/);
    const wide = file('wide.qasm', 'OPENQASM 3;\ninclude "stdgates.inc";\nqubit[2] q;\nqubit anc;\nqubit[10] w;\nh anc;\nnegctrl @ x anc, q[1];\ncx anc, q[1];\ncz anc, q[1];\nh anc;\nz q[0];\n');
    const probed = await runVerify([wide, '--encodes', fixture('ladder-annihilate-1.json'), '--signal', 'anc', '--clean', 'w', '--probes', '2', '--json']);
    expect(probed.status).toBe(0);
    const report = JSON.parse(probed.stdout);
    expect(report).toMatchObject({ ok: true, mode: 'probe', worstColumn: null, checked: 2 });
    expect(report.clean.w).toBe(0);
    expect(report.notes.join(' ')).toMatch(/lower bound/);
  });

  it('bad input exits 2 with a message naming the register, the operator field or the line', async () => {
    const lcu = fixture('lcu-two-paulis.qasm');
    const cases: [string[], RegExp][] = [
      [['--encodes', fixture('lcu-two-paulis.json'), '--clean', 'work'], /clean register 'work' is not declared in the circuit \(its qubit registers: 'q', 'anc'\)/],
      [['--encodes', fixture('lcu-two-paulis.json'), '--system', 'anc'], /pauli\[0\]\[2\]: qubit 1 in "X0 Z1" is beyond the system register 'anc' \(1 qubit\)/],
      [['--encodes', file('square.json', '{"matrix": [[[1,0],[0,0]],[[0,0]]]}')], /square\.json: matrix\[1\]: row has 1 entries, expected 2/],
      [['--encodes', file('small.json', '{"matrix": [[[1,0],[0,0]],[[0,0],[1,0]]]}')], /small\.json: matrix: a 2×2 matrix acts on 1 qubit, but the system register 'q' \(2 qubits\) needs 4×4/],
      [['--encodes', file('far.json', '{"pauli": [[1, 0, "Z5"]]}')], /far\.json: pauli\[0\]\[2\]: qubit 5 in "Z5" is beyond the system register 'q'/],
      [['--encodes', fixture('lcu-two-paulis.json'), '--alpha', '0'], /--alpha must be greater than 0/],
      [['--encodes', fixture('lcu-two-paulis.json'), '--part', 'A'], /applies only to model files/],
    ];
    for (const [args, message] of cases) {
      const result = await runVerify([lcu, ...args]);
      expect(result.status, args.join(' ')).toBe(2);
      expect(result.stderr).toMatch(message);
      expect(result.stdout).toBe('');
    }
    const measured = file('measured.qasm', 'OPENQASM 3;\ninclude "stdgates.inc";\nqubit[2] q;\nqubit anc;\nbit c;\nh anc;\nc = measure anc;\nh anc;\n');
    // The built entry maps the InputError to exit 2 and prints it on stderr.
    const result = runCli(['verify', measured, '--encodes', fixture('lcu-two-paulis.json')]);
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/measured\.qasm:7: mid-circuit measurement: qubit anc\[0\] is measured and then used again/);
  });
});
