// polewright build (built CLI): the folder of OpenQASM files (Hadamard tests and block-encodings with operator files),
// manifest.json and README.txt; the Hadamard-test files read back and simulated give the in-memory circuits'
// probabilities and, by the manifest's rule, G_ij(z); bad input → exit 2 with nothing written. (That the block-encodings
// pass their verify commands: buildVerify.test.ts.)
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.js';
import { denseGreen } from '../helpers/denseFock.js';
import { expectClose } from '../helpers/close.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import { parseQasm } from '../../src/qasm/parseQasm.js';
import { outcomeDistribution } from '../../src/sim/outcomeDistribution.js';
import { greenParts } from '../../src/readout/greenParts.js';
import { hadamardTests } from '../../src/readout/hadamardTests.js';
import { resolventEncoding } from '../../src/resolvent/resolventEncoding.js';
import { solvedGround } from '../../src/cli/readout/solvedGround.js';
import { buildCommand, type BuildCommandOptions } from '../../src/cli/commands/build.js';
import { InputError } from '../../src/core/InputError.js';

const DEMO = fileURLToPath(new URL('../../circuits/double-dot-nanowire.json', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'polewright-build-'));

describe('polewright build', () => {
  it('writes per-test OpenQASM files whose simulation matches the in-memory circuits and recombines to G_ij(z)', () => {
    const out = join(dir, 'point');
    const result = runCli(['build', DEMO, '--pair', '0,1', '--z', '-0.5,0.5', '--route', 'direct', '--out', out]);
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
    const encodings = ['H', 'A', 'B', 'a0', 'a1-dagger', 'resolvent-particle', 'particle', 'resolvent-hole', 'hole'].flatMap((name) => [`encoding-${name}.qasm`, `encoding-${name}.operator.json`]);
    expect(readdirSync(out).sort()).toEqual(['README.txt', 'hole-im.qasm', 'hole-re.qasm', 'manifest.json', 'particle-im.qasm', 'particle-re.qasm', ...encodings].sort());
    const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
    expect(manifest.pair).toEqual([0, 1]);
    expect(manifest.z).toEqual([-0.5, 0.5]);
    expect(Object.keys(manifest).slice(0, 5)).toEqual(['tool', 'version', 'command', 'inputs', 'model']);
    expect(manifest).toMatchObject({ command: 'build', inputs: { model: DEMO, pair: [0, 1], z: [-0.5, 0.5], route: 'direct', energy: null, out } });
    expect(typeof manifest.groundEnergy).toBe('number');
    expect(readFileSync(join(out, 'README.txt'), 'utf8')).toContain('2 P - 1');
    // The same circuits in memory, from the same stages.
    const model = loadModelFile(DEMO);
    const ground = solvedGround(model);
    const tests = hadamardTests(
      greenParts({ modes: 4, electrons: 2, groundEnergy: ground.energy, pair: [0, 1], z: { re: -0.5, im: 0.5 }, resolvent: (w) => resolventEncoding(model, w, { route: 'direct', precision: 1e-6 }) }),
      ground.states,
    );
    const value = { re: 0, im: 0 };
    for (const entry of manifest.files) {
      expect(Object.keys(entry).sort()).toEqual(['component', 'file', 'gates', 'kind', 'part', 'qubits', 'scale', 'state']);
      expect(entry.kind).toBe('hadamard-test');
      const text = readFileSync(join(out, entry.file), 'utf8');
      expect(text.match(/= measure /g)).toHaveLength(1);
      const circuit = parseQasm(text, entry.file);
      const fromFile = outcomeDistribution(circuit).outcomes.get('0') ?? 0;
      const test = tests.find((t) => `${t.name}.qasm` === entry.file)!;
      expectClose(fromFile, outcomeDistribution(test.circuit).outcomes.get('0') ?? 0, 1e-10, entry.file);
      expect(entry.scale).toBe(test.scale);
      value[entry.component as 're' | 'im'] += entry.scale * (2 * fromFile - 1);
    }
    // Independent reference: the mathjs dense resolvents of the exact-solver tests; direct-route bound ≈ 4e-6.
    const g = denseGreen(model, { re: -0.5, im: 0.5 })[0]![1]!;
    expect(Math.hypot(value.re - g.re, value.im - g.im)).toBeLessThanOrEqual(1e-5);
  });

  it('refuses bad input with an InputError (exit 2 through the CLI) and writes nothing', () => {
    const ring = join(dir, 'ring8.json');
    writeFileSync(ring, JSON.stringify({ lattice: { shape: 'ring', sites: 8, hopping: 1 }, interaction: 0.5, chemicalPotential: 0.5, electrons: 8, broadening: 0.5 }));
    const out = join(dir, 'refused');
    const cases: [string, Partial<BuildCommandOptions>, RegExp][] = [
      [DEMO, { pair: '5,0', z: '0.2,0.5' }, /--pair 5,0 is out of range/],
      [DEMO, { pair: '0,0', z: '0.2,-1' }, /--z needs a positive imaginary part/],
      [ring, { pair: '0,1', z: '0.2,0.5' }, /16 modes, but the exact ground-state preparation handles at most 14; give --energy E0/],
    ];
    for (const [model, given, message] of cases) {
      const options = { route: 'direct', precision: '1e-6', out, ...given } as BuildCommandOptions;
      expect(() => buildCommand(model, options)).toThrow(message);
      expect(() => buildCommand(model, options)).toThrow(InputError);
      expect(existsSync(out)).toBe(false);
    }
    const result = runCli(['build', ring, '--pair', '0,1', '--z', '0.2,0.5', '--out', out]);
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/give --energy E0/);
    expect(existsSync(out)).toBe(false);
  });

  it('builds a model too large to solve from --energy with a Slater-determinant initial state', () => {
    const ring = join(dir, 'ring8.json');
    const out = join(dir, 'ring8-out');
    const result = runCli(['build', ring, '--pair', '0,1', '--z', '0.2,0.5', '--energy', '-5', '--route', 'direct', '--out', out]);
    expect(result.status).toBe(0);
    const manifest = JSON.parse(readFileSync(join(out, 'manifest.json'), 'utf8'));
    expect(manifest.groundEnergy).toBe(-5);
    expect(manifest.initialState).toMatch(/Slater determinant/);
    expect(manifest.files).toHaveLength(4);
    // The dense operators of the resolvents and the parts (2^16 x 2^16) are not written; the manifest says why.
    expect(manifest.encodings.map((e: { file: string }) => e.file)).toEqual(['encoding-H.qasm', 'encoding-A.qasm', 'encoding-B.qasm', 'encoding-a0.qasm', 'encoding-a1-dagger.qasm']);
    expect(manifest.encodingsOmitted.map((e: { file: string }) => e.file)).toEqual(['encoding-resolvent-particle.qasm', 'encoding-particle.qasm', 'encoding-resolvent-hole.qasm', 'encoding-hole.qasm']);
    for (const omitted of manifest.encodingsOmitted) expect(omitted.reason).toMatch(/dense 2\^16 x 2\^16 matrix/);
  });

  it('reports an --out path with a NUL byte as an InputError naming --out, before building (fuzz finding)', () => {
    const options = { pair: '0,0', z: '0.2,0.5', route: 'direct', precision: '1e-6', out: `${dir}/\u0000` } as BuildCommandOptions;
    expect(() => buildCommand(DEMO, options)).toThrow(InputError);
    expect(() => buildCommand(DEMO, options)).toThrow(/^--out: ".*\\u0000" is not a valid path: it contains a NUL byte/);
  });

  it('never replaces a folder holding other files', () => {
    const out = join(dir, 'occupied');
    mkdirSync(out);
    writeFileSync(join(out, 'notes.txt'), 'keep me');
    const result = runCli(['build', DEMO, '--pair', '0,0', '--z', '0.2,0.5', '--route', 'direct', '--out', out]);
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/--out: ".*occupied" holds files this command does not write \(notes\.txt\)/);
    expect(readdirSync(out)).toEqual(['notes.txt']);
  });
});
