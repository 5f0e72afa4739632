// The fast-inverse check rows are conclusive: on every scenario in circuits/, at the check's default precision, the real
// fast inverses pass and three broken ones — built from real pieces, paired with the correct reference — fail: one that
// returns zero on the row's sector (window off by one electron), one at the conjugate shift w̄, and one whose orbital
// rotation is off by one Givens angle (built on T' = V' diag(ε) V'†, V' = V·G(θ) mixing the lowest and highest orbital).
// Every scenario has a row with more than one state in its sector, so every broken kind fails the check everywhere.
import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { groundLevel } from '../../src/exact/groundLevel.js';
import { fastInverse, type FastInverseEncoding } from '../../src/inversion/fastInverse.js';
import { oneBodyOfA } from '../../src/inversion/oneBodyOfA.js';
import type { ComplexMatrix } from '../../src/linalg/ComplexMatrix.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import { diagonalizeOneBody } from '../../src/rotations/diagonalizeOneBody.js';
import { checkItem } from '../../src/verify/checkModelBlocks.js';
import { inversionCheckItems } from '../../src/verify/inversionCheckItems.js';

const SCENARIOS = readdirSync('circuits').filter((f) => f.endsWith('.json'));
const THRESHOLDS = { tolerance: 1e-10, precision: 1e-3 };

/** T' = V' diag(ε) V'† with V' = V · G, G a Givens rotation by θ between the lowest and the highest orbital. */
function misrotated(T: ComplexMatrix, theta: number): ComplexMatrix {
  const { energies, V } = diagonalizeOneBody(T);
  const n = T.n;
  const [p, q] = [0, n - 1];
  const re = Float64Array.from(V.re);
  const im = Float64Array.from(V.im);
  for (let i = 0; i < n; i++) {
    const [ar, ai, br, bi] = [V.re[i * n + p]!, V.im[i * n + p]!, V.re[i * n + q]!, V.im[i * n + q]!];
    re[i * n + p] = Math.cos(theta) * ar - Math.sin(theta) * br;
    im[i * n + p] = Math.cos(theta) * ai - Math.sin(theta) * bi;
    re[i * n + q] = Math.sin(theta) * ar + Math.cos(theta) * br;
    im[i * n + q] = Math.sin(theta) * ai + Math.cos(theta) * bi;
  }
  const out = { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      for (let k = 0; k < n; k++) {
        // V'_ik ε_k conj(V'_jk)
        out.re[i * n + j] = out.re[i * n + j]! + energies[k]! * (re[i * n + k]! * re[j * n + k]! + im[i * n + k]! * im[j * n + k]!);
        out.im[i * n + j] = out.im[i * n + j]! + energies[k]! * (im[i * n + k]! * re[j * n + k]! - re[i * n + k]! * im[j * n + k]!);
      }
    }
  }
  return out;
}

function expectConclusive(file: string, z?: { re: number; im: number }): void {
  const model = loadModelFile(`circuits/${file}`);
  const E0 = groundLevel(model).energy;
  const items = inversionCheckItems(model, { E0, ...(z ? { z } : {}) }).slice(0, 2);
  const A = oneBodyOfA(model);
  for (const item of items) {
    const real = item.encoding as FastInverseEncoding;
    expect(real.window).not.toBeNull();
    expect(checkItem(item, THRESHOLDS).verdict).toBe('pass');
    const N = real.window!.min;
    const options = { precision: THRESHOLDS.precision, maxBits: 10 };
    const broken = {
      zero: fastInverse(A, real.w, { ...options, electrons: N === 0 ? 1 : N - 1 }),
      conjugated: fastInverse(A, { re: real.w.re, im: -real.w.im }, { ...options, electrons: N }),
      misrotated: fastInverse(misrotated(A, 0.3), real.w, { ...options, electrons: N }),
    };
    // A sector with one state (all modes filled, or none) is invariant under any orbital rotation up to a phase that
    // U† D U cancels: there a mis-rotated fast inverse is the correct operator, and the scenario's other row catches it.
    const oneState = N === 0 || N === model.modes;
    for (const [name, encoding] of Object.entries(broken)) {
      const verdict = checkItem({ ...item, encoding }, THRESHOLDS).verdict;
      if (name === 'misrotated' && oneState) expect(verdict, `${real.label}: ${name}`).toBe('pass');
      else expect(verdict, `${real.label}: ${name}`).toBe('fail');
    }
  }
}

describe('fast-inverse check rows on every scenario', () => {
  for (const file of SCENARIOS) {
    it(`${file}: the real fast inverses pass, the zero, conjugated and mis-rotated ones fail`, () => expectConclusive(file), 120_000);
  }

  it('anderson-two-bath.json at z = 0.8825311132954128 + 0.0001i (a shift next to a pole): the same', () => {
    expectConclusive('anderson-two-bath.json', { re: 0.8825311132954128, im: 0.0001 });
  }, 120_000);
});
