/**
 * fermionModelArb: a fast-check arbitrary of small random fermion models (FermionModel, as a model file gives), with a
 * Hermitian one-body matrix T and two-body terms V closed under V_ijkl = V_jilk and V_ijkl = conj(V_klij), so H is
 * Hermitian (../shared/CONVENTIONS.md). Reproducible through fast-check's own seed (`fc.assert(…, { seed })`).
 */
import fc from 'fast-check';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel, TwoBodyTerm } from '../model/FermionModel.js';

export interface FermionModelArbOptions {
  /** Fewest modes (default 1). */
  readonly minModes?: number;
  /** Most modes (default 4). */
  readonly maxModes?: number;
  /** Complex T and V entries (default true); false gives a real model. */
  readonly complex?: boolean;
  /** Most generated two-body terms before symmetrisation (default 3; 0 gives quadratic models). */
  readonly maxTwoBodyTerms?: number;
}

const entry = fc.double({ min: -1, max: 1, noNaN: true, noDefaultInfinity: true });

function zeros(n: number): ComplexMatrix {
  return { n, re: new Float64Array(n * n), im: new Float64Array(n * n) };
}

/** Sums (i,j,k,l,c) over its orbit under the two symmetries, so the result has both. */
function symmetrised(terms: readonly TwoBodyTerm[]): TwoBodyTerm[] {
  const sums = new Map<string, TwoBodyTerm>();
  const add = (i: number, j: number, k: number, l: number, re: number, im: number) => {
    const key = `${i},${j},${k},${l}`;
    const old = sums.get(key);
    sums.set(key, { i, j, k, l, re: (old?.re ?? 0) + re, im: (old?.im ?? 0) + im });
  };
  for (const { i, j, k, l, re, im } of terms) {
    add(i, j, k, l, re, im);
    add(j, i, l, k, re, im);
    add(k, l, i, j, re, -im);
    add(l, k, j, i, re, -im);
  }
  return [...sums.values()].filter((t) => t.re !== 0 || t.im !== 0);
}

export function fermionModelArb(options: FermionModelArbOptions = {}): fc.Arbitrary<FermionModel> {
  const minModes = options.minModes ?? 1;
  const maxModes = options.maxModes ?? 4;
  if (!Number.isInteger(minModes) || !Number.isInteger(maxModes) || minModes < 1 || maxModes < minModes) {
    throw new RangeError(`fermionModelArb: need integers 1 ≤ minModes ≤ maxModes, got ${minModes} and ${maxModes}`);
  }
  const complex = options.complex ?? true;
  const imaginary = complex ? entry : fc.constant(0);
  return fc.integer({ min: minModes, max: maxModes }).chain((n) => {
    const mode = fc.integer({ min: 0, max: n - 1 });
    const oneBody = fc.array(fc.tuple(entry, imaginary), { minLength: n * n, maxLength: n * n });
    const twoBody = fc.array(fc.record({ i: mode, j: mode, k: mode, l: mode, re: entry, im: imaginary }), { maxLength: options.maxTwoBodyTerms ?? 3 });
    return fc.record({ oneBody, twoBody, electrons: fc.integer({ min: 0, max: n }) }).map(({ oneBody: values, twoBody: raw, electrons }): FermionModel => {
      const T = zeros(n);
      // T = (A + A†)/2 is Hermitian whatever the entries of A.
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          const [aRe, aIm] = values[i * n + j]!;
          const [bRe, bIm] = values[j * n + i]!;
          T.re[i * n + j] = (aRe + bRe) / 2;
          T.im[i * n + j] = (aIm - bIm) / 2;
        }
      }
      return {
        name: `random-${n}-modes`,
        modes: n,
        electrons,
        oneBody: T,
        oneBodyInB: zeros(n),
        twoBody: symmetrised(raw),
        broadening: 0.1,
        grid: { from: -4, to: 4, points: 9 },
      };
    });
  });
}
