// polewright exact, check and cost (built CLI) on the continuum scenario circuits/wire-two-charges.json: the exact
// reference runs, every checked block passes (the fast inverse through A's fermionic Fourier transform included), and
// `cost --vary points=…` sweeps the grid; a bad continuum field exits 2 naming it.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.js';

const SCENARIO = 'circuits/wire-two-charges.json';
const dir = mkdtempSync(join(tmpdir(), 'polewright-continuum-'));

describe('polewright on the continuum scenario', () => {
  it('exact: a ground level of the 2-electron sector of 8 modes with bounded G', () => {
    const result = runCli(['exact', SCENARIO, '--json', '--pairs', '0:0,4:4', '--grid', '-4:4:9']);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const report = JSON.parse(result.stdout) as { modes: number; electrons: number; groundEnergy: number; degeneracy: number; residual: number };
    expect(report.modes).toBe(8);
    expect(report.electrons).toBe(2);
    expect(Number.isFinite(report.groundEnergy)).toBe(true);
    expect(report.residual).toBeLessThan(1e-8);
  });

  it('check: every block passes, the QSVT inverses by the qubitized method; the rotation and fast inverses pass', () => {
    const result = runCli(['check', SCENARIO, '--json']);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const report = JSON.parse(result.stdout) as { ok: boolean; blocks: { label: string; verdict: string; method: string; reason?: string }[] };
    expect(report.ok).toBe(true);
    for (const block of report.blocks) expect(block.verdict, block.label).toBe('pass');
    for (const label of ['inverse, preconditioned (particle)', 'inverse, preconditioned (hole)', 'inverse, direct (particle)', 'inverse, direct (hole)']) {
      expect(report.blocks.find((b) => b.label === label)?.method, label).toBe('qubitized');
    }
    for (const label of ['H', 'A (one-body)', 'B (two-body)', 'orbital rotation', 'fast inverse (particle)', 'fast inverse (hole)']) {
      expect(report.blocks.find((b) => b.label === label)?.verdict, label).toBe('pass');
    }
  });

  it('cost --vary points=4,8 writes one row per grid and route', () => {
    const out = join(dir, 'sweep');
    const result = runCli(['cost', SCENARIO, '--vary', 'points=4,8', '--out', out]);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const rows = readFileSync(join(out, 'cost.csv'), 'utf8').trim().split('\n');
    expect(rows[0]).toMatch(/^points,route,/);
    expect(rows.slice(1).map((row) => row.split(',').slice(0, 2).join(','))).toEqual(['4,preconditioned', '4,direct', '8,preconditioned', '8,direct']);
  });

  it('a box length of the wrong count exits 2 naming continuum.box', () => {
    const bad = join(dir, 'bad.json');
    const scenario = JSON.parse(readFileSync(SCENARIO, 'utf8')) as { continuum: Record<string, unknown> };
    writeFileSync(bad, JSON.stringify({ ...scenario, continuum: { ...scenario.continuum, box: [6, 6] } }));
    const result = runCli(['exact', bad]);
    expect(result.status).toBe(2);
    expect(result.stderr).toContain('continuum.box: expected 1 number (dimension 1), got 2');
  });
});
