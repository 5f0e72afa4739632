/**
 * fockOperatorMatrix: an independent reference for the check rows — a model's H, A or B (or any sum of ladder-operator
 * products) as a dense Fock-space matrix or as its action on a vector, built directly from the model's fermion terms by
 * applying a_j / a_j† to basis states with bit operations and sign counting (../shared/CONVENTIONS.md: mode j is bit j,
 * a_j|…1_j…> = (−1)^{#occupied modes below j}|…0_j…>), with no Pauli algebra in between.
 */
import { ensureFits } from '../../core/memoryBudget.js';
import type { ComplexMatrix } from '../../linalg/ComplexMatrix.js';
import type { FermionModel } from '../../model/FermionModel.js';

/** c · o_0 o_1 … o_{k−1}; factor f encodes mode f >> 1, a† when f & 1. The rightmost factor acts first. */
export interface FockTerm {
  readonly factors: readonly number[];
  readonly re: number;
  readonly im: number;
}

/** The largest mode count fockOperatorMatrix forms densely. */
export const MAX_DENSE_FOCK_MODES = 12;

const creation = (mode: number): number => 2 * mode + 1;
const annihilation = (mode: number): number => 2 * mode;

/**
 * The terms of H = Σ T_ij a_i† a_j + ½ Σ V_ijkl a_i† a_j† a_l a_k (part 'all'), of A = Σ (T − T_B)_ij a_i† a_j, or of
 * B = Σ (T_B)_ij a_i† a_j + the two-body part, read straight from model.oneBody, model.oneBodyInB and model.twoBody.
 */
export function modelFockTerms(model: FermionModel, part: 'all' | 'A' | 'B'): FockTerm[] {
  const n = model.modes;
  const terms: FockTerm[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const e = i * n + j;
      const total = { re: model.oneBody.re[e]!, im: model.oneBody.im[e]! };
      const inB = { re: model.oneBodyInB.re[e]!, im: model.oneBodyInB.im[e]! };
      const c = part === 'all' ? total : part === 'B' ? inB : { re: total.re - inB.re, im: total.im - inB.im };
      if (c.re !== 0 || c.im !== 0) terms.push({ factors: [creation(i), annihilation(j)], ...c });
    }
  }
  if (part !== 'A') {
    for (const v of model.twoBody) {
      terms.push({ factors: [creation(v.i), creation(v.j), annihilation(v.l), annihilation(v.k)], re: v.re / 2, im: v.im / 2 });
    }
  }
  return terms;
}

/** The adjoint sum: factors reversed with a ↔ a†, coefficients conjugated. */
export function adjointFockTerms(terms: readonly FockTerm[]): FockTerm[] {
  return terms.map((t) => ({ factors: [...t.factors].reverse().map((f) => f ^ 1), re: t.re, im: -t.im }));
}

/** The product's action on basis state s: the resulting basis state and sign, or null when it annihilates s. */
export function actOnBasisState(factors: readonly number[], s: number): { state: number; sign: number } | null {
  let state = s;
  let sign = 1;
  for (let f = factors.length - 1; f >= 0; f--) {
    const mode = factors[f]! >> 1;
    const bit = 1 << mode;
    const wantsOccupied = (factors[f]! & 1) === 0;
    if (((state & bit) !== 0) !== wantsOccupied) return null;
    let below = state & (bit - 1);
    let parity = 0;
    while (below !== 0) {
      below &= below - 1;
      parity ^= 1;
    }
    if (parity === 1) sign = -sign;
    state ^= bit;
  }
  return { state, sign };
}

function checkModes(terms: readonly FockTerm[], modes: number, caller: string): void {
  for (const t of terms) {
    for (const f of t.factors) if (f >> 1 >= modes) throw new RangeError(`${caller}: mode ${f >> 1} ≥ modes ${modes}`);
  }
}

/** Dense 2^n × 2^n matrix (n ≤ 12), entry [s' · 2^n + s] = <s'|op|s>. */
export function fockOperatorMatrix(terms: readonly FockTerm[], modes: number): ComplexMatrix {
  if (modes > MAX_DENSE_FOCK_MODES) throw new RangeError(`fockOperatorMatrix: ${modes} modes > ${MAX_DENSE_FOCK_MODES}`);
  checkModes(terms, modes, 'fockOperatorMatrix');
  const dim = 2 ** modes;
  ensureFits(16 * dim * dim, 'dense Fock-space reference operator');
  const re = new Float64Array(dim * dim);
  const im = new Float64Array(dim * dim);
  for (const t of terms) {
    for (let s = 0; s < dim; s++) {
      const image = actOnBasisState(t.factors, s);
      if (image === null) continue;
      re[image.state * dim + s] = re[image.state * dim + s]! + image.sign * t.re;
      im[image.state * dim + s] = im[image.state * dim + s]! + image.sign * t.im;
    }
  }
  return { n: dim, re, im };
}

/** y = op · x for a vector of 2^n amplitudes (any n a state vector fits). */
export function applyFockOperator(terms: readonly FockTerm[], modes: number, re: Float64Array, im: Float64Array): { re: Float64Array; im: Float64Array } {
  checkModes(terms, modes, 'applyFockOperator');
  const dim = 2 ** modes;
  if (re.length !== dim || im.length !== dim) throw new RangeError(`applyFockOperator: vector length ${re.length} ≠ 2^${modes}`);
  const outRe = new Float64Array(dim);
  const outIm = new Float64Array(dim);
  for (const t of terms) {
    for (let s = 0; s < dim; s++) {
      const xr = re[s]!;
      const xi = im[s]!;
      if (xr === 0 && xi === 0) continue;
      const image = actOnBasisState(t.factors, s);
      if (image === null) continue;
      outRe[image.state] = outRe[image.state]! + image.sign * (t.re * xr - t.im * xi);
      outIm[image.state] = outIm[image.state]! + image.sign * (t.re * xi + t.im * xr);
    }
  }
  return { re: outRe, im: outIm };
}
