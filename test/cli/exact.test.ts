// polewright exact: summary, --json shape, files written (deterministic), bad options → exit 2 naming the option.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { exactCommand } from '../../src/cli/commands/exact.js';
import { isInputError } from '../../src/core/InputError.js';

const dir = mkdtempSync(join(tmpdir(), 'polewright-exact-'));
const dimer = join(dir, 'dimer.json');
writeFileSync(
  dimer,
  JSON.stringify({
    electrons: 2,
    lattice: { shape: 'chain', sites: 2, hopping: 1 },
    interaction: 4,
    chemicalPotential: 2,
    spin: 0,
    broadening: 0.1,
    grid: { from: -4, to: 4, points: 41 },
  }),
);

async function capture(run: () => Promise<void>): Promise<string> {
  let out = '';
  const spy = vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => {
    out += String(chunk);
    return true;
  });
  try {
    await run();
  } finally {
    spy.mockRestore();
  }
  return out;
}

async function inputErrorOf(run: () => Promise<void>): Promise<string> {
  try {
    await capture(run);
  } catch (error) {
    if (isInputError(error)) return error.message;
    throw error;
  }
  throw new Error('expected an InputError');
}

afterEach(() => vi.restoreAllMocks());

describe('polewright exact', () => {
  it('prints sector, E0, degeneracy, gap and timings', async () => {
    const out = await capture(() => exactCommand(dimer, {}));
    expect(out).toMatch(/sector: 2 electrons \(1 up, 1 down\), dimension 4/);
    // Hubbard dimer, standard textbook result (from memory): E0 = (U − c)/2 − 2μ = 2 − √32/2 − 4.
    expect(out).toMatch(/ground energy: -4\.8284271247/);
    expect(out).toMatch(/degeneracy: 1/);
    expect(out).toMatch(/gap: /);
    expect(out).toMatch(/timings: ground level/);
  });

  it('--json prints exactly the documented keys with one entry per pair', async () => {
    const out = await capture(() => exactCommand(dimer, { json: true, grid: '-1:1:3', pairs: '0:0,0:1', eta: '0.2' }));
    const obj = JSON.parse(out);
    expect(Object.keys(obj)).toEqual(['groundEnergy', 'degeneracy', 'gap', 'electrons', 'modes', 'broadening', 'frequencies', 'entries']);
    expect(obj.frequencies).toEqual([-1, 0, 1]);
    expect(obj.broadening).toBe(0.2);
    expect(obj.entries.map((e: { i: number; j: number }) => [e.i, e.j])).toEqual([[0, 0], [0, 1]]);
    expect(obj.entries[0].values).toHaveLength(3);
    expect(obj.entries[0].values[0]).toHaveLength(2);
  });

  it('--out writes green.json (same object as --json), green.csv and both plots, byte-identical on a rerun', async () => {
    const outDir = join(dir, 'out');
    const json = await capture(() => exactCommand(dimer, { json: true }));
    await capture(() => exactCommand(dimer, { out: outDir }));
    const first = ['green.json', 'green.csv', 'spectral.svg', 'selfenergy.svg'].map((f) => readFileSync(join(outDir, f), 'utf8'));
    expect(first[0]).toBe(json);
    expect(first[1]!.split('\n')[0]).toBe('omega,i,j,re,im');
    expect(first[1]!.trim().split('\n')).toHaveLength(1 + 41 * 16);
    expect(first[2]).toMatch(/^<svg/);
    expect(first[2]).toContain('A(ω) (1/energy)');
    expect(first[3]).toContain('Im Σ_00');
    await capture(() => exactCommand(dimer, { out: outDir }));
    const second = ['green.json', 'green.csv', 'spectral.svg', 'selfenergy.svg'].map((f) => readFileSync(join(outDir, f), 'utf8'));
    expect(second).toEqual(first);
  });

  it('names the option in the error for bad --eta, --grid and --pairs', async () => {
    expect(await inputErrorOf(() => exactCommand(dimer, { eta: '0' }))).toMatch(/--eta/);
    expect(await inputErrorOf(() => exactCommand(dimer, { eta: '-1' }))).toMatch(/--eta/);
    expect(await inputErrorOf(() => exactCommand(dimer, { grid: '1:2' }))).toMatch(/--grid/);
    expect(await inputErrorOf(() => exactCommand(dimer, { grid: '0:1:0' }))).toMatch(/--grid.*points/);
    expect(await inputErrorOf(() => exactCommand(dimer, { grid: '2:1:5' }))).toMatch(/--grid/);
    expect(await inputErrorOf(() => exactCommand(dimer, { pairs: '0:4' }))).toMatch(/--pairs.*out of range/);
    expect(await inputErrorOf(() => exactCommand(dimer, { pairs: '0-1' }))).toMatch(/--pairs/);
  });

  it('exits 0 on success and 2 with a message on stderr for bad input (spawned entry point)', () => {
    const tsx = join(process.cwd(), 'node_modules', '.bin', 'tsx');
    const main = join(process.cwd(), 'src', 'cli', 'main.ts');
    const ok = spawnSync(tsx, [main, 'exact', dimer, '--json', '--grid', '0:1:2'], { encoding: 'utf8' });
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).degeneracy).toBe(1);
    const bad = spawnSync(tsx, [main, 'exact', dimer, '--eta', '-0.5'], { encoding: 'utf8' });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/--eta must be greater than 0/);
    const missing = spawnSync(tsx, [main, 'exact', join(dir, 'nope.json')], { encoding: 'utf8' });
    expect(missing.status).toBe(2);
  }, 60000);
});
