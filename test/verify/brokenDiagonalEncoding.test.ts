// The arithmetic-B check row is conclusive on the Hubbard scenarios in circuits/: the real encoding of B − b0 passes
// against B's fermion terms, and a broken one — every flag amplitude of the wrong sign, −(B − b0)/β — fails; on the
// continuum scenario (Coulomb coefficients, rounded by the register) the row checked against its rounded coefficients
// passes and the sign-flipped variant fails against the same reference.
import { describe, expect, it } from 'vitest';
import { diagonalEncoding } from '../../src/inversion/diagonalEncoding.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import { checkItem, checkModelBlocks } from '../../src/verify/checkModelBlocks.js';
import { CHECK_REGISTER_BITS, diagonalCheckItem } from '../../src/verify/diagonalCheckItem.js';
import { fockReference } from '../../src/verify/fockReference.js';
import { modelFockTerms } from '../../src/verify/internal/fockOperatorMatrix.js';

const THRESHOLDS = { tolerance: 1e-10, precision: 1e-3 };

describe('check of the arithmetic B encoding', () => {
  for (const file of ['hubbard-dimer.json', 'hubbard-ring4.json']) {
    it(`passes on ${file} (the dimer: also as a checkModelBlocks row) and fails for the sign-flipped variant`, () => {
      const model = loadModelFile(`circuits/${file}`);
      const real = diagonalEncoding(model, { precision: THRESHOLDS.precision });
      const broken = diagonalEncoding(model, { precision: THRESHOLDS.precision, negatedForTest: true });
      if ('notDiagonal' in real || 'notDiagonal' in broken) throw new Error('Hubbard B is diagonal');
      const reference = () => fockReference([...modelFockTerms(model, 'B'), { factors: [], re: -real.shift, im: 0 }], model.modes);
      expect(checkItem({ encoding: real, reference }, THRESHOLDS).verdict).toBe('pass');
      expect(checkItem({ encoding: broken, reference }, THRESHOLDS).verdict).toBe('fail');
      if (file === 'hubbard-dimer.json') {
        const row = checkModelBlocks(model, THRESHOLDS).find((r) => r.label === real.label);
        expect(row).toMatchObject({ verdict: 'pass', alpha: real.alpha });
      }
    });
  }

  it('checks the continuum scenario against its rounded coefficients: the real row passes, the sign-flipped one fails', () => {
    const model = loadModelFile('circuits/wire-two-charges.json');
    const item = diagonalCheckItem(model, 1e-6);
    if (item === null) throw new Error('the continuum B is diagonal');
    expect(item.encoding.label).toMatch(/rounded coefficients/);
    const row = checkItem(item, { tolerance: 1e-10, precision: 1e-6 });
    expect(row.verdict).toBe('pass');
    expect(row.maxError!).toBeLessThanOrEqual(1e-10);
    const broken = diagonalEncoding(model, { precision: 1e-6, maxBits: CHECK_REGISTER_BITS, negatedForTest: true });
    if ('notDiagonal' in broken) throw new Error('the continuum B is diagonal');
    const brokenRow = checkItem({ encoding: { ...broken, errorBound: broken.boundParts.floatingPoint }, reference: item.reference! }, { tolerance: 1e-10, precision: 1e-6 });
    expect(brokenRow.verdict).toBe('fail');
  });
});
