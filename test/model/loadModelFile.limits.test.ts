// loadModelFile on hostile input found by fuzzing: each is an InputError naming the field (or key and line),
// refused before any large allocation — duplicated keys, huge lattices, huge grids, huge magnitudes,
// oversized files and endless devices.
import { existsSync, mkdtempSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { isInputError } from '../../src/core/InputError.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import { MAX_GRID_POINTS, MAX_MODEL_FILE_BYTES, MAX_MODES } from '../../src/model/modelLimits.js';

const dir = mkdtempSync(join(tmpdir(), 'polewright-limits-'));
let counter = 0;

function errorOf(text: string): string {
  const path = join(dir, `m${counter++}.json`);
  writeFileSync(path, text);
  return errorOfPath(path);
}

function errorOfPath(path: string): string {
  try {
    loadModelFile(path);
  } catch (error) {
    if (isInputError(error)) return error.message;
    throw error;
  }
  throw new Error('expected an InputError');
}

const dimer = { electrons: 2, lattice: { shape: 'chain', sites: 2, hopping: 1 }, interaction: 4 };
const withDimer = (extra: object): string => JSON.stringify({ ...dimer, ...extra });

describe('loadModelFile(path) on hostile input', () => {
  it('names a duplicated key and both lines (JSON.parse would keep the last value)', () => {
    const text = '{\n  "electrons": 2,\n  "lattice": { "shape": "chain", "sites": 2, "hopping": 1 },\n  "interaction": 4,\n' +
      '  "chemicalPotential": 1,\n  "chemicalPotential": 1e308\n}\n';
    expect(errorOf(text)).toMatch(/m\d+\.json:6:3: .*duplicate key "chemicalPotential" in the top-level object \(first given on line 5\)/);
    const nested = '{"electrons": 2, "lattice": {"shape": "chain", "shape": "ring", "sites": 2, "hopping": 1}, "interaction": 4}';
    expect(errorOf(nested)).toMatch(/duplicate key "shape" in the object at lattice/);
    expect(errorOf('{"a": {"k": 1}, "b": {"k": 2}, "name": "x\\"y", "modes": 1, "electrons": 0}')).toMatch(/unknown key/);
  });

  it(`refuses lattices of more than ${MAX_MODES} modes before building them`, () => {
    expect(errorOf(JSON.stringify({ ...dimer, lattice: { shape: 'ring', sites: 1_000_000, hopping: 1 } }))).toMatch(/lattice\.sites: must be ≤ 512/);
    expect(errorOf(JSON.stringify({ ...dimer, lattice: { shape: 'ring', sites: 3000, hopping: 1 } }))).toMatch(/lattice\.sites: must be ≤ 512/);
    expect(errorOf(JSON.stringify({ ...dimer, lattice: { shape: 'grid', size: [500, 500], hopping: 1 } }))).toMatch(/lattice: 250000 sites make 500000 modes/);
    expect(errorOf(JSON.stringify({ modes: 1e9, electrons: 1 }))).toMatch(/modes: must be ≤ 1024/);
  });

  it(`refuses more than ${MAX_GRID_POINTS} grid points and grids far beyond the model's energy scale`, () => {
    expect(errorOf(withDimer({ grid: { from: -1, to: 1, points: 1_000_000_000 } }))).toMatch(/grid\.points: must be ≤ 100000/);
    expect(errorOf(withDimer({ grid: { from: -1e308, to: 1e308, points: 11 } }))).toMatch(/grid: from and to must lie within ±/);
    expect(errorOf(withDimer({ grid: { from: 2, to: 1, points: 11 } }))).toMatch(/grid: needs from < to/);
  });

  it('refuses magnitudes outside the stated ranges, naming the field', () => {
    expect(errorOf(withDimer({ broadening: 1e308 }))).toMatch(/broadening: must be ≤ 1000000/);
    expect(errorOf(withDimer({ broadening: 1e-12 }))).toMatch(/broadening: must be ≥ 1e-9/);
    expect(errorOf(withDimer({ chemicalPotential: 1e308 }))).toMatch(/chemicalPotential: must be ≤ 1000000/);
    expect(errorOf(withDimer({ interaction: -1e400 }))).toMatch(/interaction: /);
    expect(errorOf(JSON.stringify({ modes: 2, electrons: 1, oneBody: [[0, 0, 1e308]] }))).toMatch(/oneBody\[0\]\[2\]: must lie within ±1000000/);
  });

  it(`refuses a file over ${MAX_MODEL_FILE_BYTES / 2 ** 20} MiB by its size and an endless device after reading that much`, () => {
    const big = join(dir, 'big.json');
    writeFileSync(big, '');
    truncateSync(big, 3 * 2 ** 30); // sparse: no disk space used
    expect(errorOfPath(big)).toMatch(/larger than 64 MiB/);
    if (existsSync('/dev/zero')) expect(errorOfPath('/dev/zero')).toMatch(/larger than 64 MiB/);
  });
});
