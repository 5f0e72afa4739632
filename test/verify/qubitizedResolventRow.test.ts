import { describe, expect, it } from 'vitest';
import { resolventEncoding } from '../../src/resolvent/resolventEncoding.js';
import { checkItem } from '../../src/verify/checkModelBlocks.js';
import { fockOperatorMatrix, modelFockTerms } from '../../src/verify/internal/fockOperatorMatrix.js';
import { sectorResolvent } from '../../src/verify/internal/sectorResolvent.js';
import { sectorStates } from '../../src/verify/inversionCheckItems.js';
import { qubitizedResolventRow } from '../../src/verify/qubitizedResolventRow.js';
import { denseReference } from '../../src/verify/verifyEncoding.js';
import { hubbard } from '../helpers/models.js';

const model = hubbard({ sites: 2, hopping: 1, interaction: 0.5, chemicalPotential: 0.3 });
const H = fockOperatorMatrix(modelFockTerms(model, 'all'), 4);
const states = sectorStates(4, 3);
const referenceAt = (w: { re: number; im: number }) => () => denseReference(sectorResolvent(H, w, { min: 3, max: 3 }));
const limits = { tolerance: 1e-10, precision: 1e-2 };

describe('qubitizedResolventRow', () => {
  for (const route of ['direct', 'preconditioned'] as const) {
    it(`(${route}) finds the same error as simulating the whole sequence column by column, and passes`, () => {
      const w = { re: 0.37, im: 1.1 };
      const encoding = resolventEncoding(model, w, { route, precision: 1e-3 });
      const whole = checkItem({ encoding, reference: referenceAt(w), columns: states }, limits);
      const row = qubitizedResolventRow(encoding, referenceAt(w), states, limits, 'test');
      expect(whole.method).toBe('columns');
      expect(row.method).toBe('qubitized');
      expect(row.verdict).toBe('pass');
      expect(Math.abs(row.maxError! - whole.maxError!)).toBeLessThan(1e-10);
    });
  }

  it('fails against the resolvent of a different shift, and skips, stating both reasons, when even its own work is beyond the limit', () => {
    const w = { re: 0.37, im: 1.1 };
    const encoding = resolventEncoding(model, w, { route: 'preconditioned', precision: 1e-3 });
    const wrong = qubitizedResolventRow(encoding, referenceAt({ re: 0.4, im: 1.1 }), states, limits, 'test');
    expect(wrong.verdict).toBe('fail');
    const skipped = qubitizedResolventRow(encoding, referenceAt(w), states, { ...limits, maxSimulationWork: 1e3 }, 'whole sequence too costly');
    expect(skipped.verdict).toBe('skipped');
    expect(skipped.reason).toMatch(/whole sequence too costly; the qubitized check needs .* also beyond the limit/);
  });
});
