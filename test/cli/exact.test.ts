// polewright exact: summary, --json shape, files written (deterministic), bad options → exit 2 naming the option,
// spin multiplets counted whole unless the file fixes spin, error bounds in every output, the JSON header and
// extra fields (residual, G0, A(ω)), --out written as one folder that replaces an earlier one whole.
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { exactCommand } from '../../src/cli/commands/exact.js';
import { isInputError } from '../../src/core/InputError.js';
import { VERSION } from '../../src/core/version.js';
import { expectClose } from '../helpers/close.js';

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
      'tool', 'version', 'command', 'inputs', 'model', 'residual',
      'groundEnergy', 'degeneracy', 'gap', 'electrons', 'modes', 'spinSectors', 'spin', 'groundSectors',
      'broadening', 'tolerance', 'frequencies', 'entries', 'selfEnergy', 'nonInteracting', 'spectral', 'errors',
    ]);
    expect([obj.tool, obj.version, obj.command, obj.model]).toEqual(['polewright', VERSION, 'exact', 'dimer']);
    expect(obj.inputs).toEqual({ file: dimer, broadening: 0.2, grid: { from: -1, to: 1, points: 3 }, pairs: [[0, 0], [0, 1]], tolerance: 1e-6 });
    expect(obj.residual).toBeGreaterThanOrEqual(0);
    expect(obj.residual).toBeLessThan(1e-6);
    expect(obj.nonInteracting.entries.map((e: { i: number; j: number }) => [e.i, e.j])).toEqual([[0, 0], [0, 1]]);
    expect(obj.spectral.entries.map((e: { i: number }) => e.i)).toEqual([0]);
    expect(obj.errors.residual).toMatch(/H psi - E0 psi/);
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

  it('--json gives A_ii = −Im G_ii/π with bounds δG/π, and G0 = G for a model without interaction', async () => {
    const quadratic = join(dir, 'quadratic.json');
    writeFileSync(quadratic, JSON.stringify({ modes: 2, electrons: 1, oneBody: [[0, 0, -1], [1, 1, 1], [0, 1, 0.5], [1, 0, 0.5]], grid: { from: -2, to: 2, points: 5 } }));
    const obj = JSON.parse(await capture(() => exactCommand(quadratic, { json: true })));
    // Spectral function A(ω) = −(1/π) Im G(ω + iη) (CONVENTIONS.md, standard definition).
    const g00 = obj.entries.find((e: { i: number; j: number }) => e.i === 0 && e.j === 0);
    const a0 = obj.spectral.entries.find((e: { i: number }) => e.i === 0);
    g00.values.forEach(([, im]: [number, number], k: number) => expectClose(a0.values[k], -im / Math.PI, 1e-15));
    g00.bounds.forEach((b: number, k: number) => expectClose(a0.bounds[k], b / Math.PI, 1e-15 * Math.max(1, b)));
    // Non-interacting limit G(z) = (z − T)⁻¹ = G0(z) (CONVENTIONS.md; Fetter & Walecka, free propagator).
    obj.entries.forEach((e: { values: [number, number][]; bounds: number[] }, x: number) => {
      e.values.forEach(([re, im], k) => {
        const [re0, im0] = obj.nonInteracting.entries[x].values[k];
        expectClose(re, re0, 1e-9 + e.bounds[k]!);
        expectClose(im, im0, 1e-9 + e.bounds[k]!);
      });
    });
  });

  it('--out replaces an earlier folder whole (no stale selfenergy.svg after a --pairs rerun) and says so on stderr', async () => {
    const outDir = join(dir, 'rerun');
    await capture(() => exactCommand(dimer, { out: outDir, grid: '-1:1:5' }));
    expect(readdirSync(outDir).sort()).toEqual(['green.csv', 'green.json', 'selfenergy.svg', 'spectral.svg']);
    let stderr = '';
    vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => {
      stderr += String(chunk);
      return true;
    });
    await capture(() => exactCommand(dimer, { out: outDir, grid: '-1:1:5', pairs: '0:0' }));
    expect(readdirSync(outDir).sort()).toEqual(['green.csv', 'green.json', 'spectral.svg']);
    expect(stderr).toContain(`replaced the earlier contents of "${outDir}" with this run's 3 files`);
    expect(readdirSync(dir).filter((name) => name.includes('.tmp') || name.includes('.old'))).toEqual([]);
  });

  it('--out refuses, before solving, a folder holding files exact does not write, and a path through a file', async () => {
    const mine = join(dir, 'mine');
    mkdirSync(mine);
    writeFileSync(join(mine, 'notes.txt'), 'keep me');
    expect(await inputErrorOf(() => exactCommand(dimer, { out: mine }))).toMatch(/--out: ".*mine" holds files this command does not write \(notes\.txt\)/);
    expect(readFileSync(join(mine, 'notes.txt'), 'utf8')).toBe('keep me');
    expect(await inputErrorOf(() => exactCommand(dimer, { out: join(dimer, 'sub') }))).toMatch(/is not a folder/);
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
    expect(await inputErrorOf(() => exactCommand(dimer, { eta: '1e308' }))).toMatch(/--eta must lie from 1e-9 to 1000000, got "1e308"/);
    expect(await inputErrorOf(() => exactCommand(dimer, { eta: '1e400' }))).toBe('--eta must lie from 1e-9 to 1000000, got "1e400" (beyond the double range, ±1.8e308)');
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
    expect(bad.stderr).toMatch(/--eta must lie from 1e-9 to 1000000, got "-0\.5"/);
    const missing = spawnSync(tsx, [main, 'exact', join(dir, 'nope.json')], { encoding: 'utf8' });
    expect(missing.status).toBe(2);
  }, 60000);
});
