import { describe, expect, it } from 'vitest';
import { resolventCheckEncodings } from '../../src/resolvent/resolventCheckEncodings.js';
import { hubbard } from '../helpers/models.js';

describe('resolventCheckEncodings', () => {
  it('gives the four rows, in order, at w⁺ = z + E0 and w⁻ = E0 − z with the N ± 1 sectors', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
    const z = { re: 0.1, im: 1 };
    const rows = resolventCheckEncodings(model, { E0: -2.25, z, precision: 0.05 });
    expect(rows.map((r) => r.label)).toEqual([
      'inverse, preconditioned (particle)',
      'inverse, preconditioned (hole)',
      'inverse, direct (particle)',
      'inverse, direct (hole)',
    ]);
    expect(rows.map((r) => r.electrons)).toEqual([3, 1, 3, 1]);
    // CONVENTIONS.md: particle part at w = z + E0, hole part at w = E0 − z.
    expect(rows[0]!.encoding.report.w).toEqual({ re: 0.1 - 2.25, im: 1 });
    expect(rows[1]!.encoding.report.w).toEqual({ re: -2.25 - 0.1, im: -1 });
    expect(rows.map((r) => r.encoding.report.route)).toEqual(['preconditioned', 'preconditioned', 'direct', 'direct']);
    expect(rows.every((r) => r.encoding.report.window === null)).toBe(true);
    const windowed = resolventCheckEncodings(model, { E0: -2.25, z, precision: 0.05, window: true });
    expect(windowed[1]!.encoding.report.window).toEqual({ min: 1, max: 1 });
  });
});
