// polewright demo (built CLI) on the built-in double-dot scenario: plot, table, circuits and check table written; every
// gate-level point within its bound and 1e-6 of the exact value; and the recorded circuits/demo-point/ regenerated (by the
// function scripts/generate-circuits.ts calls) byte for byte.
import { mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import { DEMO_MODEL_PATH, demoPointFiles } from '../../src/cli/readout/demoScenario.js';
import { solvedGround } from '../../src/cli/readout/solvedGround.js';
import { writeFolderAtomic } from '../../src/core/writeFolderAtomic.js';

const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const RECORDED = join(ROOT, 'circuits', 'demo-point');
const dir = mkdtempSync(join(tmpdir(), 'polewright-demo-'));

function sameFolder(actual: string, expected: string): void {
  expect(readdirSync(actual).sort()).toEqual(readdirSync(expected).sort());
  for (const name of readdirSync(expected)) expect(readFileSync(join(actual, name), 'utf8'), name).toBe(readFileSync(join(expected, name), 'utf8'));
}

describe('polewright demo', () => {
  it('writes the spectrum plot, the table of gate-level against exact values, the circuits of one point and the check table', () => {
    const out = join(dir, 'demo');
    const result = runCli(['demo', '--out', out]);
    expect(result.status).toBe(0);
    expect(result.stderr).toMatch(/^demo: /m);
    expect(readdirSync(out).sort()).toEqual(['check.txt', 'circuits', 'points.csv', 'spectrum.svg', 'table.txt']);
    const svg = readFileSync(join(out, 'spectrum.svg'), 'utf8');
    for (const text of ['double-dot-nanowire', 'exact (Lanczos) A_00', 'gate level, preconditioned route', 'gate level, direct route']) expect(svg).toContain(text);
    const rows = readFileSync(join(out, 'points.csv'), 'utf8').trim().split('\n').slice(1).map((line) => line.split(','));
    expect(new Set(rows.map((r) => r[1]))).toEqual(new Set(['preconditioned', 'direct']));
    for (const row of rows) {
      const [difference, bound] = [Number(row[6]), Number(row[7])];
      expect(difference, row.join(',')).toBeLessThanOrEqual(bound);
      expect(difference, row.join(',')).toBeLessThanOrEqual(1e-6);
    }
    expect(readFileSync(join(out, 'check.txt'), 'utf8')).toMatch(/0 failed/);
    sameFolder(join(out, 'circuits'), RECORDED);
  });

  it('regenerates circuits/demo-point/ (what scripts/generate-circuits.ts writes) with identical bytes', () => {
    const out = join(dir, 'regenerated');
    const model = loadModelFile(DEMO_MODEL_PATH);
    writeFolderAtomic(out, demoPointFiles(model, solvedGround(model)));
    sameFolder(out, RECORDED);
  });
});
