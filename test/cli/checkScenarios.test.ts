// Every demo scenario in circuits/ passes `polewright check`: all its block-encodings verify by simulation. The QSVT inverse
// rows of the 8-mode scenarios are too costly to simulate whole and are checked by the qubitized method instead.
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
        blocks: { label: string; systemQubits: number; maxError: number; errorBound: number; verdict: string; method: string; reason?: string }[];
      };
      expect(report.ok).toBe(true);
      // Every row conclusive: checked (not skipped), and every bound below the precision.
      for (const block of report.blocks) {
        expect(block.verdict, block.label).toBe('pass');
        expect(block.errorBound).toBeLessThanOrEqual(report.precision);
      }
      const labels = report.blocks.map((b) => b.label);
      for (const label of [
        'fast inverse (particle)', 'fast inverse (hole)', 'direct shift (particle)', 'direct shift (hole)',
        'inverse, preconditioned (particle)', 'inverse, preconditioned (hole)', 'inverse, direct (particle)', 'inverse, direct (hole)',
      ]) {
        expect(labels).toContain(label);
      }
      if (file === 'hubbard-ring4.json') {
        for (const block of report.blocks.filter((b) => b.label.startsWith('inverse, '))) expect(block.method, block.label).toBe('qubitized');
      }
    });
  }
});
