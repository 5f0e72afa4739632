// polewright exact: summary, --json shape, files written (deterministic), bad options → exit 2 naming the option,
// spin multiplets counted whole unless the file fixes spin, error bounds in every output.
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

const chain3 = join(dir, 'chain3.json');
const chain3Model = {
  electrons: 3,
  lattice: { shape: 'chain', sites: 3, hopping: 1 },
  interaction: 4,
  chemicalPotential: 0.5,
  grid: { from: -3, to: 3, points: 7 },
};
writeFileSync(chain3, JSON.stringify(chain3Model));
const chain3Fixed = join(dir, 'chain3-fixed.json');
writeFileSync(chain3Fixed, JSON.stringify({ ...chain3Model, spin: -1 }));

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
    expect(Object.keys(obj)).toEqual([
      'groundEnergy', 'degeneracy', 'gap', 'electrons', 'modes', 'spinSectors', 'spin', 'groundSectors',
      'broadening', 'tolerance', 'frequencies', 'entries', 'selfEnergy', 'errors',
    ]);
    expect(obj.spinSectors).toBe('fixed');
    expect(obj.spin).toBe(0);
    expect(obj.selfEnergy).toBeNull();
    expect(obj.entries[0].bounds).toHaveLength(3);
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
    expect(first[1]!.split('\n')[0]).toBe('omega,i,j,re,im,bound');
    expect(first[1]!.trim().split('\n')).toHaveLength(1 + 41 * 16);
    expect(first[2]).toMatch(/^<svg/);
    expect(first[2]).toContain('A(ω) (1/energy)');
    expect(first[3]).toContain('Σ_00');
    expect(first[3]).toContain('Re solid, Im dashed');
    await capture(() => exactCommand(dimer, { out: outDir }));
    const second = ['green.json', 'green.csv', 'spectral.svg', 'selfenergy.svg'].map((f) => readFileSync(join(outDir, f), 'utf8'));
    expect(second).toEqual(first);
  });

  it('counts a doublet twice and averages both S_z sectors unless the file fixes spin, and says which', async () => {
    const all = JSON.parse(await capture(() => exactCommand(chain3, { json: true })));
    expect(all.degeneracy).toBe(2);
    expect(all.spinSectors).toBe('all');
    expect(all.groundSectors.map((g: { up: number; down: number }) => [g.up, g.down])).toEqual([[2, 1], [1, 2]]);
    const fixed = JSON.parse(await capture(() => exactCommand(chain3Fixed, { json: true })));
    expect(fixed.degeneracy).toBe(1);
    expect([fixed.spinSectors, fixed.spin]).toEqual(['fixed', -1]);
    expect(await capture(() => exactCommand(chain3, {}))).toMatch(/spin: every S_z sector counts .*2 up 1 down \(1\), 1 up 2 down \(1\)/);
    expect(await capture(() => exactCommand(chain3Fixed, {}))).toMatch(/spin: fixed by the model file to N↑ − N↓ = -1; .*restricted to that S_z sector/);
  });

  it('reports bounds on G and Σ in text and JSON, and --tolerance sets the continued-fraction tolerance', async () => {
    const text = await capture(() => exactCommand(chain3, {}));
    expect(text).toMatch(/error: \|δG_ij\| ≤ \d\.\d\de[-+]\d+ .*rigorous continued-fraction truncation bound; tolerance 0\.000001/);
    expect(text).toMatch(/self-energy: \|δΣ_ij\| ≤ \d\.\d\de[-+]\d+/);
    const obj = JSON.parse(await capture(() => exactCommand(chain3, { json: true, tolerance: '1e-3' })));
    expect(obj.tolerance).toBe(1e-3);
    expect(obj.selfEnergy.entries).toHaveLength(36);
    expect(obj.selfEnergy.bounds).toHaveLength(7);
    expect(obj.errors.green).toMatch(/rigorous/);
    expect(await inputErrorOf(() => exactCommand(chain3, { tolerance: '0' }))).toMatch(/--tolerance/);
    expect(await inputErrorOf(() => exactCommand(chain3, { tolerance: '1e-20' }))).toMatch(/--tolerance must lie from 1e-14 to 0\.1/);
    expect(await inputErrorOf(() => exactCommand(chain3, { tolerance: 'x' }))).toMatch(/--tolerance/);
  });

  it('refuses grids beyond the model scale or with too many points, naming --grid', async () => {
    expect(await inputErrorOf(() => exactCommand(dimer, { grid: '-1e308:1e308:11' }))).toMatch(/--grid: from and to must lie within/);
    expect(await inputErrorOf(() => exactCommand(dimer, { grid: '-1:1:1000000000' }))).toMatch(/--grid .*points must be an integer from 1 to 100000/);
    expect(await inputErrorOf(() => exactCommand(dimer, { eta: '1e308' }))).toMatch(/--eta must lie from/);
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
