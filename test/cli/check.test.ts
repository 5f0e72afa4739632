import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.js';

const MODEL = 'circuits/explicit-three-mode.json';

describe('polewright check MODEL', () => {
  it('prints one row per block with the fixed labels and passes', () => {
    const result = runCli(['check', MODEL]);
    expect(result.status).toBe(0);
    for (const label of [
      'annihilation 0', 'creation 2', 'H', 'A (one-body)', 'B (two-body)', 'orbital rotation', 'orbital rotation inverse',
      'Slater determinant', 'fast inverse (particle)', 'fast inverse (hole)', 'direct shift (particle)', 'direct shift (hole)',
    ]) {
      expect(result.stdout).toMatch(new RegExp(`^${label.replace(/[()]/g, '\\$&')}\\s`, 'm'));
    }
    expect(result.stdout).not.toContain('FAIL');
  });

  it('--json prints { tool, version, command, inputs, ok, z, tolerance, precision, E0, blocks[label, …, passed, method, verdict] }', () => {
    const result = runCli(['check', MODEL, '--json']);
    expect(result.status).toBe(0);
    const report = JSON.parse(result.stdout);
    expect(Object.keys(report)).toEqual(['tool', 'version', 'command', 'inputs', 'ok', 'z', 'tolerance', 'precision', 'E0', 'blocks']);
    expect(report).toMatchObject({ tool: 'polewright', command: 'check', inputs: { file: MODEL } });
    expect(report).toMatchObject({ ok: true, z: { re: 0, im: 0.1 }, tolerance: 1e-10, precision: 1e-6 });
    // Ladder operators, H, A, B, the orbital rotations, the Slater determinant, four inversion rows, four QSVT inverse rows.
    expect(report.blocks).toHaveLength(3 * 2 + 6 + 4 + 4);
    for (const block of report.blocks) {
      expect(Object.keys(block)).toEqual([
        'label', 'systemQubits', 'ancillaQubits', 'alpha', 'maxError', 'errorBound', 'gates', 'costNotes', 'passed', 'method', 'verdict',
      ]);
      expect(block).toMatchObject({ passed: true, verdict: 'pass' });
      expect(block.maxError).toBeLessThanOrEqual(Math.max(1e-10, block.errorBound));
      expect(block.errorBound).toBeLessThanOrEqual(1e-6);
    }
    // The fast inverse's α = 1/c never exceeds 1/η (default z = grid midpoint + iη, η = 0.1 in this model).
    for (const label of ['fast inverse (particle)', 'fast inverse (hole)']) {
      expect(report.blocks.find((b: { label: string }) => b.label === label).alpha).toBeLessThanOrEqual(1 / 0.1 + 1e-12);
    }
    expect(report.blocks.find((b: { label: string }) => b.label === 'creation 1')).toMatchObject({ systemQubits: 3, ancillaQubits: 1, alpha: 1 });
    // The Pauli LCUs report the Toffoli cost of SELECT by unary iteration (its L − 1 formula is tested in test/blocks).
    const h = report.blocks.find((b: { label: string }) => b.label === 'H');
    expect(h.costNotes).toHaveLength(1);
    expect(h.costNotes[0].source).toMatch(/Babbush/);
  });

  it('exits 1 when a block exceeds the tolerance', () => {
    const result = runCli(['check', MODEL, '--json', '--tolerance', '1e-300']);
    expect(result.status).toBe(1);
    const report = JSON.parse(result.stdout);
    expect(report.ok).toBe(false);
    expect(report.blocks.some((b: { verdict: string }) => b.verdict === 'fail')).toBe(true);
  });

  it('exits 1 and marks the fast inverses INCONCLUSIVE when their bound exceeds --precision, stated in the table', () => {
    // The fast-inverse bounds carry a floating-point term of order 1e-12, above a precision of 1e-14.
    const result = runCli(['check', MODEL, '--precision', '1e-14']);
    expect(result.status).toBe(1);
    expect(result.stdout).toMatch(/precision 1e-14/);
    expect(result.stdout).toMatch(/^fast inverse \(particle\)\s.*INCONCLUSIVE$/m);
    expect(result.stdout).toMatch(/fast inverse \(particle\): INCONCLUSIVE: bound .* exceeds the precision 1e-14/);
    expect(result.stdout).not.toContain('FAIL');
  });

  it('exits 2 with a message naming the problem for bad input', () => {
    const dir = mkdtempSync(join(tmpdir(), 'pw-check-'));
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, '{ "modes": 2, "oneBody": [[0, 5, 1]] }');
    const missing = runCli(['check', bad]);
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/electrons/);
    expect(missing.stderr).not.toMatch(/\n\s+at /);
    const tolerance = runCli(['check', MODEL, '--tolerance', 'abc']);
    expect(tolerance.status).toBe(2);
    expect(tolerance.stderr).toMatch(/--tolerance/);
    const z = runCli(['check', MODEL, '--z', '0.5,-0.1']);
    expect(z.status).toBe(2);
    expect(z.stderr).toMatch(/--z/);
    for (const precision of ['0', '1', 'abc', '-1e-3']) {
      const bad = runCli(['check', MODEL, '--precision', precision]);
      expect(bad.status).toBe(2);
      expect(bad.stderr).toMatch(/--precision/);
    }
  });
});
