// Mutation tests of the check rows' references: encodings built from a wrong Jordan–Wigner map (a and a† swapped) or with
// the ½ of the two-body term dropped must fail against the reference built from the model's fermion terms.
import { readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { modelEncodings } from '../../src/blocks/builders/modelEncodings.js';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { loadModelFile } from '../../src/model/loadModelFile.js';
import type { LadderSum, LadderTerm } from '../../src/operators/LadderSum.js';
import { jordanWigner } from '../../src/operators/jordanWigner.js';
import { modelHamiltonian } from '../../src/operators/modelHamiltonian.js';
import { checkItem } from '../../src/verify/checkModelBlocks.js';
import { fockReference } from '../../src/verify/fockReference.js';
import { modelFockTerms } from '../../src/verify/internal/fockOperatorMatrix.js';

const SCENARIOS = readdirSync('circuits').filter((f) => f.endsWith('.json'));
const THRESHOLDS = { tolerance: 1e-10, precision: 1e-3 };

/** Jordan–Wigner with a_j and a_j† exchanged: the image of every ladder factor with the other dagger. */
function swappedJordanWigner(op: LadderSum, modes: number) {
  return jordanWigner({ terms: op.terms.map((t) => ({ ...t, ops: t.ops.map((o) => ({ ...o, dagger: !o.dagger })) })) }, modes);
}

/** H with the two-body terms at full V (the ½ dropped). */
function withoutHalf(model: FermionModel): LadderSum {
  const terms: LadderTerm[] = [...modelHamiltonian({ ...model, twoBody: [] }).terms];
  for (const v of model.twoBody) {
    terms.push({ ops: [{ mode: v.i, dagger: true }, { mode: v.j, dagger: true }, { mode: v.l, dagger: false }, { mode: v.k, dagger: false }], re: v.re, im: v.im });
  }
  return { terms };
}

describe('check rows against the fermion-term reference', () => {
  for (const file of SCENARIOS) {
    const model = loadModelFile(`circuits/${file}`);
    const n = model.modes;
    const reference = (part: 'all' | 'A') => () => fockReference(modelFockTerms(model, part), n);

    it(`${file}: the real H and A pass, and fail when Jordan–Wigner swaps a and a†`, () => {
      const { H, A } = modelEncodings(model);
      expect(checkItem({ encoding: H, reference: reference('all') }, THRESHOLDS).verdict).toBe('pass');
      expect(checkItem({ encoding: A, reference: reference('A') }, THRESHOLDS).verdict).toBe('pass');
      for (const part of ['all', 'A'] as const) {
        const mutant = pauliLcu(swappedJordanWigner(modelHamiltonian(model, { part }), n), 'mutant');
        expect(checkItem({ encoding: mutant, reference: reference(part) }, THRESHOLDS).verdict).toBe('fail');
      }
    });

    it(`${file}: H fails when the ½ of the two-body term is dropped`, () => {
      expect(model.twoBody.length).toBeGreaterThan(0);
      const mutant = pauliLcu(jordanWigner(withoutHalf(model), n), 'mutant');
      expect(checkItem({ encoding: mutant, reference: reference('all') }, THRESHOLDS).verdict).toBe('fail');
    });
  }
});
