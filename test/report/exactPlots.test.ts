// exactPlots: the self-energy plot draws only entries that are not zero on the whole grid (and names the
// ones left out), each in its own colour with Re solid and Im dashed; no plot for a non-interacting model.
import { describe, expect, it } from 'vitest';
import { solveExact } from '../../src/exact/solveExact.js';
import { exactPlots } from '../../src/report/exactPlots.js';
import { anderson, quadraticModel } from '../helpers/models.js';

describe('exactPlots(solution, modelName)', () => {
  it('leaves out Σ entries that vanish everywhere (bath modes of an impurity) and draws the rest in distinct colours', async () => {
    // Anderson impurity: the interaction acts on the impurity only, so Σ is zero outside the impurity entries
    // (common practice: the self-energy of the Anderson model is local to the impurity).
    const model = { ...anderson(-1, 2, [{ level: 0.5, coupling: 0.5 }, { level: -0.3, coupling: 0.4 }], 0, 3), grid: { from: -3, to: 3, points: 9 } };
    const plots = await exactPlots(solveExact(model), 'impurity-test');
    expect(plots.selfEnergy).not.toBeNull();
    expect(plots.notes.join('\n')).toMatch(/leaves out entries that are zero on the whole grid: Σ_11, Σ_22, Σ_44, Σ_55/);
    const svg = plots.selfEnergy!;
    expect(svg).toContain('Σ_00');
    expect(svg).toContain('Σ_33');
    expect(svg).not.toContain('Σ_11');
    expect(svg).toContain('impurity-test: self-energy');
    expect(svg).toContain('diagonal entry Σ_ii');
    expect(plots.spectral).toContain('impurity-test: spectral function');
    const lines = [...svg.matchAll(/<path[^>]*stroke="(#[0-9a-f]{6})"[^>]*stroke-dasharray="([^"]+)"/g)];
    expect(new Set(lines.map((m) => m[1])).size).toBe(2);
  });

  it('writes no self-energy plot when Σ is zero everywhere (no interaction)', async () => {
    const T = anderson(0, 0, [{ level: 0.5, coupling: 0.5 }], 0, 2).oneBody;
    const plots = await exactPlots(solveExact(quadraticModel(T, 2)), 'quadratic-test');
    expect(plots.selfEnergy).toBeNull();
    expect(plots.spectral).not.toBeNull();
    expect(plots.notes.join('\n')).toMatch(/every diagonal entry of Σ is zero/);
  });
});
