// The user-facing fast-check arbitraries of src/testing: what each promises (Hermitian models and sums, unit states,
// reproducible samples), and that neither the CLI nor the main entry can load fast-check through them.
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { hermiticityError } from '../../src/linalg/hermiticityError.js';
import { ladderSumMatrix } from '../../src/operators/ladderSumMatrix.js';
import { modelHamiltonian } from '../../src/operators/modelHamiltonian.js';
import { pauliSumMatrix } from '../../src/operators/pauliSumMatrix.js';
import { fermionModelArb } from '../../src/testing/fermionModelArb.js';
import { hermitianPauliSumArb, pauliSumArb } from '../../src/testing/pauliSumArb.js';
import { stateVectorArb } from '../../src/testing/stateVectorArb.js';
import { expectClose } from '../helpers/close.js';

describe('src/testing arbitraries', () => {
  it('fermionModelArb gives models whose H (and T) are Hermitian, within the mode range asked for', () => {
    fc.assert(
      fc.property(fermionModelArb({ minModes: 2, maxModes: 4 }), (model) => {
        expect(model.modes).toBeGreaterThanOrEqual(2);
        expect(model.modes).toBeLessThanOrEqual(4);
        expect(hermiticityError(model.oneBody)).toBeLessThan(1e-15);
        // H = H† is the defining property of a physical Hamiltonian (CONVENTIONS.md: V must make H Hermitian).
        expect(hermiticityError(ladderSumMatrix(modelHamiltonian(model), model.modes))).toBeLessThan(1e-12);
      }),
      { seed: 8, numRuns: 40 },
    );
  });

  it('fermionModelArb({ complex: false, maxTwoBodyTerms: 0 }) gives real quadratic models', () => {
    fc.assert(
      fc.property(fermionModelArb({ complex: false, maxTwoBodyTerms: 0 }), (model) => {
        expect(model.twoBody).toEqual([]);
        expect(model.oneBody.im.every((v) => v === 0)).toBe(true);
      }),
      { seed: 9, numRuns: 20 },
    );
  });

  it('hermitianPauliSumArb gives Hermitian sums; pauliSumArb stays on the qubits asked for', () => {
    fc.assert(
      fc.property(hermitianPauliSumArb(3), pauliSumArb(2, 6), (hermitian, any) => {
        expect(hermiticityError(pauliSumMatrix(hermitian))).toBeLessThan(1e-15);
        expect(any.qubits).toBe(2);
        expect(any.terms.every((t) => t.x < 4n && t.z < 4n)).toBe(true);
      }),
      { seed: 10, numRuns: 40 },
    );
  });

  it('stateVectorArb gives unit states, the same ones for the same fast-check seed', () => {
    fc.assert(fc.property(stateVectorArb(3), (state) => expectClose(state.norm(), 1, 1e-14, 'norm')), { seed: 11, numRuns: 40 });
    const first = fc.sample(stateVectorArb(2), { seed: 12, numRuns: 3 });
    const again = fc.sample(stateVectorArb(2), { seed: 12, numRuns: 3 });
    expect(again.map((s) => [...s.re, ...s.im])).toEqual(first.map((s) => [...s.re, ...s.im]));
  });

  it('refuse sizes they cannot serve with a RangeError naming the arbitrary', () => {
    expect(() => stateVectorArb(0)).toThrow(/^stateVectorArb: /);
    expect(() => pauliSumArb(31)).toThrow(/^pauliSumArb: /);
    expect(() => fermionModelArb({ minModes: 3, maxModes: 2 })).toThrow(/^fermionModelArb: /);
  });
});

describe('fast-check stays out of the CLI and the main entry', () => {
  const SRC = resolve(dirname(fileURLToPath(import.meta.url)), '../../src');

  /** Every src file a run-time import chain reaches from `entry`, and the packages those files import. */
  function reach(entry: string): { files: Set<string>; packages: Set<string> } {
    const files = new Set<string>();
    const packages = new Set<string>();
    const visit = (file: string) => {
      if (files.has(file)) return;
      files.add(file);
      const text = readFileSync(file, 'utf8');
      for (const match of text.matchAll(/(?:import|export)(\s+type)?\s[^'";]*?from\s+'([^']+)'|import\s+'([^']+)'/g)) {
        if (match[1]) continue;
        const target = match[2] ?? match[3]!;
        if (target.startsWith('.')) visit(resolve(dirname(file), target.replace(/\.js$/, '.ts')));
        else packages.add(target);
      }
    };
    visit(resolve(SRC, entry));
    return { files, packages };
  }

  it('src/cli/main.ts and src/index.ts reach no module that imports fast-check', () => {
    for (const entry of ['cli/main.ts', 'index.ts']) expect([...reach(entry).packages], entry).not.toContain('fast-check');
  });

  it('src/testing/index.ts does reach fast-check (so the check above can fail)', () => {
    expect([...reach('testing/index.ts').packages]).toContain('fast-check');
  });
});
