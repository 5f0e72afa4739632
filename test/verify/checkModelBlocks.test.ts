import { describe, expect, it } from 'vitest';
import { ladderEncoding } from '../../src/blocks/builders/ladderEncoding.js';
import { checkItem, checkModelBlocks, MAX_SIMULATED_QUBITS } from '../../src/verify/checkModelBlocks.js';
import { fockReference } from '../../src/verify/fockReference.js';

const THRESHOLDS = { tolerance: 1e-10, precision: 1e-3 };
import { hubbard } from '../helpers/models.js';

describe('checkModelBlocks(model)', () => {
  it('passes every row of a small model and appends `extra` encodings (their own exact() as reference)', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 3, chemicalPotential: 0.5 });
    const rows = checkModelBlocks({ ...model, electrons: 2 }, { extra: [ladderEncoding(1, true, 4)] });
    expect(rows.map((r) => r.verdict)).toEqual(rows.map(() => 'pass'));
    expect(rows.at(-1)!.label).toBe('creation 1');
    expect(rows.find((r) => r.label === 'Slater determinant')!.method).toBe('state');
  });

  it('checks what it can of a 14-mode model (no dense matrix above 12) and skips the rest with a reason, never throwing', () => {
    const model = { ...hubbard({ sites: 7, hopping: 1, interaction: 2, chemicalPotential: 0 }), electrons: 2 };
    // A small work limit keeps this test fast: every simulated row is skipped for cost, with the reason; one ladder row is
    // then checked by probing at the default limit, against the fermion-term reference (no dense matrix above 12 modes).
    const rows = checkModelBlocks(model, { maxSimulationWork: 2 ** 20 });
    const byLabel = new Map(rows.map((r) => [r.label, r]));
    expect(byLabel.get('creation 13')!.reason).toMatch(/simulation work .* exceeds the limit/);
    const ladder = checkItem({ encoding: ladderEncoding(13, true, 14), reference: () => fockReference([{ factors: [2 * 13 + 1], re: 1, im: 0 }], 14) }, THRESHOLDS);
    expect(ladder).toMatchObject({ verdict: 'pass', method: 'probe (lower bound)' });
    expect(ladder.powerIteration!.estimate).toBeLessThan(1e-12);
    expect(byLabel.get('Slater determinant')!.verdict).toBe('pass');
    expect(byLabel.get('orbital rotation')).toMatchObject({ verdict: 'skipped', maxError: null });
    expect(byLabel.get('orbital rotation')!.reason).toMatch(/10 modes/);
    const H = byLabel.get('H')!;
    expect(H.systemQubits + H.ancillaQubits).toBeLessThanOrEqual(MAX_SIMULATED_QUBITS);
    expect(H).toMatchObject({ verdict: 'skipped', passed: false });
    expect(H.reason).toMatch(/simulation work .* exceeds the limit/);
    expect(rows.every((r) => r.verdict === 'pass' || r.verdict === 'skipped')).toBe(true);
  }, 60_000);

  it('skips every row of a 30-mode model (too wide to simulate) instead of failing to form a matrix', () => {
    const model = { ...hubbard({ sites: 15, hopping: 1, interaction: 2, chemicalPotential: 0 }), electrons: 2 };
    const rows = checkModelBlocks(model);
    expect(rows.length).toBe(2 * 30 + 7);
    for (const row of rows) {
      expect(row.verdict).toBe('skipped');
      expect(row.reason).toMatch(/simulation limit of 20|10 modes/);
    }
  }, 60_000);
});
