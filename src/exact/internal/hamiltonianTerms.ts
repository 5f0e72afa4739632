/**
 * hamiltonianTerms: the model's H regrouped for the sector kernels. Two-body terms are brought to
 * the canonical form Σ_{i<j, k<l} W a_i† a_j† a_l a_k with
 * W = ½(V_ijkl − V_jikl − V_ijlk + V_jilk); the ones with {i,j} = {k,l} become densities W n_i n_j.
 */
import type { FermionModel } from '../../model/FermionModel.js';

export interface Hop {
  readonly i: number;
  readonly j: number;
  readonly re: number;
  readonly im: number;
}

/** A generic off-diagonal term c · (product of ladders), ladders as [mode, dagger] left to right. */
export interface LadderTerm {
  readonly ops: readonly (readonly [number, boolean])[];
  readonly re: number;
  readonly im: number;
}

export interface HamiltonianTerms {
  readonly modes: number;
  readonly lowModes: number;
  readonly real: boolean;
  /** T_ii (real part; T is Hermitian). */
  readonly onsite: Float64Array;
  /** W n_i n_j, i < j. */
  readonly densities: readonly { readonly i: number; readonly j: number; readonly w: number }[];
  /** a_i† a_j with i ≠ j both low modes / both high modes (high ones in high-mode coordinates). */
  readonly lowHops: readonly Hop[];
  readonly highHops: readonly Hop[];
  /** Everything else: hops between low and high modes, off-diagonal two-body terms. */
  readonly generic: readonly LadderTerm[];
  /** True when every term keeps the number of low electrons fixed. */
  readonly conservesLowCount: boolean;
}

const ZERO = 1e-15;

export function hamiltonianTerms(model: FermionModel, lowModes: number): HamiltonianTerms {
  const n = model.modes;
  const T = model.oneBody;
  const onsite = new Float64Array(n);
  const lowHops: Hop[] = [];
  const highHops: Hop[] = [];
  const generic: LadderTerm[] = [];
  let real = true;
  let conserves = true;
  const isLow = (m: number): boolean => m < lowModes;
  for (let i = 0; i < n; i++) {
    onsite[i] = T.re[i * n + i]!;
    for (let j = 0; j < n; j++) {
      if (i === j) continue;
      const re = T.re[i * n + j]!;
      const im = T.im[i * n + j]!;
      if (Math.abs(re) <= ZERO && Math.abs(im) <= ZERO) continue;
      if (im !== 0) real = false;
      if (isLow(i) && isLow(j)) lowHops.push({ i, j, re, im });
      else if (!isLow(i) && !isLow(j)) highHops.push({ i: i - lowModes, j: j - lowModes, re, im });
      else {
        conserves = false;
        generic.push({ ops: [[i, true], [j, false]], re, im });
      }
    }
  }
  const canonical = new Map<string, { i: number; j: number; k: number; l: number; re: number; im: number }>();
  for (const t of model.twoBody) {
    if (t.i === t.j || t.k === t.l) continue;
    const sign = (t.i < t.j ? 1 : -1) * (t.k < t.l ? 1 : -1);
    const i = Math.min(t.i, t.j);
    const j = Math.max(t.i, t.j);
    const k = Math.min(t.k, t.l);
    const l = Math.max(t.k, t.l);
    const key = `${i},${j},${k},${l}`;
    const entry = canonical.get(key) ?? { i, j, k, l, re: 0, im: 0 };
    entry.re += 0.5 * sign * t.re;
    entry.im += 0.5 * sign * t.im;
    canonical.set(key, entry);
  }
  const densities: { i: number; j: number; w: number }[] = [];
  const keys = [...canonical.keys()].sort();
  for (const key of keys) {
    const w = canonical.get(key)!;
    if (Math.abs(w.re) <= ZERO && Math.abs(w.im) <= ZERO) continue;
    if (w.i === w.k && w.j === w.l) {
      densities.push({ i: w.i, j: w.j, w: w.re });
      continue;
    }
    if (w.im !== 0) real = false;
    const lowBefore = Number(isLow(w.k)) + Number(isLow(w.l));
    const lowAfter = Number(isLow(w.i)) + Number(isLow(w.j));
    if (lowBefore !== lowAfter) conserves = false;
    generic.push({ ops: [[w.i, true], [w.j, true], [w.l, false], [w.k, false]], re: w.re, im: w.im });
  }
  return { modes: n, lowModes, real, onsite, densities, lowHops, highHops, generic, conservesLowCount: conserves };
}
