// Every demo scenario in circuits/ passes `polewright check`: all its block-encodings verify by simulation.
import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runCli } from '../helpers/runCli.js';

const SCENARIOS = readdirSync('circuits').filter((f) => f.endsWith('.json'));

describe('polewright check on circuits/*.json', () => {
  it('finds the demo scenarios', () => {
    expect(SCENARIOS.length).toBeGreaterThanOrEqual(4);
  });

  for (const file of SCENARIOS) {
    it(`verifies every block of ${file}, fast inverses within bounds below the precision`, () => {
      const result = runCli(['check', `circuits/${file}`, '--json']);
      expect(result.stderr).toBe('');
      expect(result.status).toBe(0);
      const report = JSON.parse(result.stdout) as {
        ok: boolean;
        precision: number;
        blocks: { label: string; maxError: number; errorBound: number; verdict: string }[];
      };
      expect(report.ok).toBe(true);
      // Every row conclusive: checked (not skipped), and every bound below the precision.
      for (const block of report.blocks) {
        expect(block.verdict, block.label).toBe('pass');
        expect(block.errorBound).toBeLessThanOrEqual(report.precision);
      }
      const labels = report.blocks.map((b) => b.label);
      for (const label of ['fast inverse (particle)', 'fast inverse (hole)', 'direct shift (particle)', 'direct shift (hole)']) {
        expect(labels).toContain(label);
      }
    });
  }
});
