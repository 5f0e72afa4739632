import { describe, expect, it } from 'vitest';
import { directShift } from '../../src/inversion/directShift.js';
import { fastInverse } from '../../src/inversion/fastInverse.js';
import { greensShifts } from '../../src/inversion/greensShifts.js';
import { inversionCheckEncodings } from '../../src/inversion/inversionCheckEncodings.js';
import { verifyEncoding } from '../../src/verify/verifyEncoding.js';
import { expectClose } from '../helpers/close.js';
import { hubbard } from '../helpers/models.js';

describe('directShift(model, w)', () => {
  it('encodes w − H exactly, with α growing linearly in the scale of A while the fast inverse stays ≤ 1/|Im w|', () => {
    const w = { re: 0.4, im: 0.3 };
    const alphas: number[] = [];
    for (const s of [1, 10, 100]) {
      const model = hubbard({ sites: 2, hopping: s, interaction: 1, chemicalPotential: 0.5 });
      const shift = directShift(model, w);
      expect(verifyEncoding(shift).maxError).toBeLessThan(1e-10);
      alphas.push(shift.alpha);
      expect(fastInverse(model.oneBody, w, { precision: 0.05, maxBits: 6 }).alpha).toBeLessThanOrEqual(1 / w.im + 1e-12);
    }
    // α = |w| + Σ|Pauli coefficients| of H; the hopping part contributes 4 strings of weight s/2 (XX and YY per bond and spin),
    // so α(100) − α(10) = 10·(α(10) − α(1)) (Jordan–Wigner, common practice).
    expectClose(alphas[2]! - alphas[1]!, 10 * (alphas[1]! - alphas[0]!), 1e-10);
    expect(alphas[2]!).toBeGreaterThan(100);
  });
});

describe('greensShifts(E0, z)', () => {
  it('gives the particle shift z + E0 and the hole shift E0 − z', () => {
    expect(greensShifts(-1.5, { re: 0.25, im: 0.1 })).toEqual({ particle: { re: -1.25, im: 0.1 }, hole: { re: -1.75, im: -0.1 } });
  });
});

describe('inversionCheckEncodings(model, { E0 })', () => {
  it('builds the four labelled rows, each verified within max(1e-10, its bound)', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 2, chemicalPotential: 1, electrons: 2 });
    const rows = inversionCheckEncodings(model, { E0: -1.3 });
    expect(rows.map((r) => r.label)).toEqual(['fast inverse (particle)', 'fast inverse (hole)', 'direct shift (particle)', 'direct shift (hole)']);
    for (const row of rows) {
      expect(row.encoding.label).toBe(row.label);
      const bound = 'quantisationBound' in row.encoding ? (row.encoding.quantisationBound as number) : 0;
      expect(verifyEncoding(row.encoding).maxError).toBeLessThanOrEqual(Math.max(1e-10, bound));
    }
  }, 30_000);
});
