// polewright estimate (built CLI): the --json shape, the gate-level value against the exact solver within the reported
// bound on the demo scenario, shot mode with its standard error, --grid, and bad input → exit 2 naming the problem.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.js';
import { denseGreen } from '../helpers/denseFock.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import { estimateCommand, MAX_ESTIMATE_WORK, type EstimateCommandOptions } from '../../src/cli/commands/estimate.js';
import { isInputError } from '../../src/core/InputError.js';

const DEMO = fileURLToPath(new URL('../../circuits/double-dot-nanowire.json', import.meta.url));
const ENTRY = fileURLToPath(new URL('../../dist/cli/main.js', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'polewright-estimate-'));

describe('polewright estimate', () => {
  it('--json prints value, exact value, bound and parts; the value is within the bound (and 1e-6) of a dense G', () => {
    const result = runCli(['estimate', DEMO, '--pair', '0,1', '--z', '0.3,0.5', '--route', 'direct', '--json']);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const json = JSON.parse(result.stdout);
    expect(json.pair).toEqual([0, 1]);
    expect(json.z).toEqual([0.3, 0.5]);
    expect(json.route).toBe('direct');
    expect(json.stdError).toBeNull();
    expect(Object.keys(json.parts)).toEqual(['particle', 'hole']);
    expect(Object.keys(json).slice(0, 5)).toEqual(['tool', 'version', 'command', 'inputs', 'model']);
    expect(json).toMatchObject({ command: 'estimate', inputs: { model: DEMO, pair: [0, 1], z: [0.3, 0.5], grid: null, route: 'direct', precision: 1e-6, loadState: false } });
    expect(json.qubits).toBeGreaterThan(4);
    expect(json.alpha).toBeGreaterThan(1);
    expect(json.errorBound).toBeLessThanOrEqual(1e-4);
    // Independent reference: the mathjs dense resolvents of the exact-solver tests.
    const g = denseGreen(loadModelFile(DEMO), { re: 0.3, im: 0.5 })[0]![1]!;
    const gap = Math.hypot(json.value[0] - g.re, json.value[1] - g.im);
    expect(gap).toBeLessThanOrEqual(json.errorBound);
    expect(gap).toBeLessThanOrEqual(1e-6);
    expect(json.value[0]).toBeCloseTo(json.parts.particle[0] + json.parts.hole[0], 12);
  });

  it('--shots reports a standard error and the value lies within 4 of them of the exact value', () => {
    // Binomial sampling of each Hadamard test (Aharonov, Jones & Landau, STOC 2006); 4σ, common practice.
    const result = runCli(['estimate', DEMO, '--pair', '0,0', '--z', '-0.5,0.5', '--route', 'direct', '--shots', '20000', '--seed', '3', '--json']);
    expect(result.status).toBe(0);
    const json = JSON.parse(result.stdout);
    expect(json.stdError).toHaveLength(2);
    expect(Math.abs(json.value[0] - json.exact[0])).toBeLessThanOrEqual(4 * json.stdError[0] + json.errorBound);
    expect(Math.abs(json.value[1] - json.exact[1])).toBeLessThanOrEqual(4 * json.stdError[1] + json.errorBound);
    expect(json.shotPlan.shotsPerTest).toBeGreaterThan(1);
  });

  it('--grid prints one row per frequency with gate-level and exact values', () => {
    const result = runCli(['estimate', DEMO, '--pair', '1,1', '--grid', '-1:1:3', '--route', 'direct']);
    expect(result.status).toBe(0);
    expect(result.stdout).toContain('G_11(ω + iη), η = 0.5, direct route');
    expect(result.stdout.split('\n').filter((line) => /^\s*(-1\.00000|0\.00000|1\.00000)\s/.test(line))).toHaveLength(3);
  });

  it('refuses bad input with an InputError naming it (exit 2 through the CLI)', async () => {
    const cases: [Partial<EstimateCommandOptions>, RegExp][] = [
      [{ pair: '0,4', z: '0.2,0.5' }, /--pair 0,4 is out of range: the model has modes 0…3/],
      [{ pair: '0,0', z: '0.2,0' }, /--z needs a positive imaginary part/],
      [{ pair: '0,0', z: '0.2,-0.5' }, /--z needs a positive imaginary part/],
      [{ pair: '0,0' }, /exactly one of --z re,im and --grid/],
      [{ pair: '0,0', z: '0.2,0.5', route: 'sideways' }, /--route must be "preconditioned" or "direct"/],
      [{ pair: '0,0', z: '0.2,0.5', shots: '0' }, /--shots must be a whole number from 1 to 1000000000/],
    ];
    for (const [given, message] of cases) {
      const options = { route: 'direct', seed: '1', precision: '1e-6', ...given } as EstimateCommandOptions;
      await expect(estimateCommand(DEMO, options)).rejects.toSatisfy((error: unknown) => isInputError(error) && message.test((error as Error).message));
    }
    const result = runCli(['estimate', DEMO, '--pair', '0,4', '--z', '0.2,0.5']);
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/^polewright: --pair 0,4 is out of range/);
  });

  it('refuses, before simulating, a readout beyond MAX_ESTIMATE_WORK (hubbard-ring4 with --load-state: ~1e11 updates; fuzz finding)', async () => {
    const ring4 = fileURLToPath(new URL('../../circuits/hubbard-ring4.json', import.meta.url));
    expect(MAX_ESTIMATE_WORK).toBe(2 ** 34);
    const options = { pair: '0,0', z: '0.3,0.1', route: 'direct', seed: '1', precision: '1e-6', loadState: true } as EstimateCommandOptions;
    await expect(estimateCommand(ring4, options)).rejects.toSatisfy(
      (error: unknown) =>
        isInputError(error) &&
        /^estimate: simulating this readout takes about \d\.\de\+11 amplitude updates .* beyond the limit 1\.7e\+10 \(2\^34\); .*polewright build.*polewright cost/.test((error as Error).message),
    );
  }, 60000);

  it('refuses a model too large to simulate before allocating, naming the qubit count', () => {
    const ring = join(dir, 'ring6.json');
    writeFileSync(ring, JSON.stringify({ lattice: { shape: 'ring', sites: 6, hopping: 1 }, interaction: 0.5, chemicalPotential: 0.5, electrons: 6, spin: 0, broadening: 0.5 }));
    const result = spawnSync(process.execPath, [ENTRY, 'estimate', ring, '--pair', '0,1', '--z', '0.2,0.5', '--route', 'direct'], {
      encoding: 'utf8',
      env: { ...process.env, POLEWRIGHT_MEMORY_LIMIT: '8000000' },
    });
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/readout \(22 qubits, 23 in its Hadamard-test circuit\) is too large to simulate: a 22-qubit state vector needs/);
  });
});
