// polewright cost: JSON shape for both routes, the stated assumptions, the --vary sweep files, and clear errors.
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.js';

const dir = mkdtempSync(join(tmpdir(), 'polewright-cost-'));
const model = join(dir, 'chain.json');
writeFileSync(model, JSON.stringify({ lattice: { shape: 'chain', sites: 2, hopping: 1 }, interaction: 4, electrons: 2, broadening: 0.1 }));

describe('polewright cost', () => {
  it('prints both routes as JSON with the required fields', () => {
    const result = runCli(['cost', model, '--json', '--energy', '-1.5', '--precision', '0.05']);
    expect(result.status).toBe(0);
    const json = JSON.parse(result.stdout);
    for (const route of ['preconditioned', 'direct']) {
      for (const field of ['logicalQubits', 'toffoli', 'tCount', 'rotations', 'queries', 'shots', 'alpha', 'degree', 'errorBudget']) {
        expect(json[route]).toHaveProperty(field);
      }
      expect(json[route].toffoli).toBeGreaterThan(0);
    }
    expect(json.groundEnergySource).toBe('given');
    expect(Object.keys(json).slice(0, 4)).toEqual(['tool', 'version', 'command', 'inputs']);
    expect(json).toMatchObject({ tool: 'polewright', command: 'cost', inputs: { model, pair: [0, 0], precision: 0.05, energy: -1.5, toffoliT: 4, multiControl: 'measured', prepToffoli: null } });
  });

  it("reports B's encoding (JSON and a note line), and --whole-fock drops the preconditioned route's window", () => {
    const windowed = JSON.parse(runCli(['cost', model, '--json', '--energy', '-1.5', '--precision', '0.05']).stdout);
    const whole = JSON.parse(runCli(['cost', model, '--json', '--energy', '-1.5', '--precision', '0.05', '--whole-fock', '--b-encoding', 'arithmetic']).stdout);
    const b = windowed.preconditioned.bEncoding;
    expect(['pauli', 'arithmetic']).toContain(b.used);
    // Dimer, U = 4: the Pauli LCU of B' = Σ_sites (U/4)(−Z↑ − Z↓ + Z↑Z↓) has α = 2·3U/4 = 6 (from memory: Jordan–Wigner of n = (1 − Z)/2);
    // the arithmetic β is at most U·N/2 on the N = 3 (particle) or N = 1 (hole) window.
    expect(b.alphaPauli).toBeCloseTo(6, 12);
    expect(b.alphaArithmetic).toBeLessThanOrEqual(6);
    expect(b.toffoli.pauli).toBeGreaterThan(0);
    expect(windowed.direct.bEncoding).toBeNull();
    expect(whole.inputs).toMatchObject({ bEncoding: 'arithmetic', window: false });
    expect(whole.preconditioned.bEncoding).toMatchObject({ used: 'arithmetic', alphaArithmetic: 4 });
    expect(whole.preconditioned.parts[0].notes.join('\n')).toMatch(/whole Fock space/);
    expect(windowed.preconditioned.parts[0].notes.join('\n')).toMatch(/electron window/);
    const table = runCli(['cost', model, '--energy', '-1.5', '--precision', '0.05']).stdout;
    expect(table).toMatch(/preconditioned \(particle\): B' encoding used: .*Pauli alpha = 6\.000, arithmetic alpha = /);
    const bad = runCli(['cost', model, '--b-encoding', 'dense']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/--b-encoding must be pauli, arithmetic or cheaper/);
  });

  it('says in the table that the ground-state preparation is not counted', () => {
    const result = runCli(['cost', model]);
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/preconditioned\s+direct/);
    expect(result.stdout).toMatch(/Ground-state preparation is NOT counted/);
    expect(result.stdout).toMatch(/lower bound/);
  });

  it('writes cost.csv and cost.svg for --vary', () => {
    const out = join(dir, 'sweep');
    const result = runCli(['cost', model, '--vary', 'hopping=1,10', '--out', out]);
    expect(result.status).toBe(0);
    const csv = readFileSync(join(out, 'cost.csv'), 'utf8').trim().split('\n');
    expect(csv[0]).toMatch(/^hopping,route,.*,queries,/);
    expect(csv).toHaveLength(5);
    // One fitted-exponent line per route (the fit itself is tested in test/report/logLogSlope.test.ts).
    expect(result.stdout).toMatch(/preconditioned: Toffoli per run ~ hopping\^-?\d+\.\d\d, queries ~ hopping\^-?\d+\.\d\d/);
    expect(result.stdout).toMatch(/direct: Toffoli per run ~ hopping\^/);
    expect(readFileSync(join(out, 'cost.svg'), 'utf8')).toMatch(/^<svg/);
  });

  it('reports a precision below what can be planned (1e-300) as not met, with the figures of the finest plan, exit 0', () => {
    const result = runCli(['cost', model, '--precision', '1e-300']);
    expect(result.stderr).not.toMatch(/internal error/);
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/PRECISION NOT MET/);
  });

  it('rejects an unknown --vary key, an empty value list and ε ≤ 0 with exit 2', () => {
    const unknown = runCli(['cost', model, '--vary', 'gauge=1,2', '--out', dir]);
    expect(unknown.status).toBe(2);
    expect(unknown.stderr).toMatch(/--vary: unknown key "gauge"/);
    const empty = runCli(['cost', model, '--vary', 'hopping=', '--out', dir]);
    expect(empty.status).toBe(2);
    expect(empty.stderr).toMatch(/value list is empty/);
    const zero = runCli(['cost', model, '--precision', '0']);
    expect(zero.status).toBe(2);
    expect(zero.stderr).toMatch(/--precision must be greater than 0/);
  });
});
