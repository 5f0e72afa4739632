// Independent dense reference on the whole Fock space for the readout tests: H entry by entry from the Jordan–Wigner
// rules of CONVENTIONS.md (a_m flips bit m with sign (−1)^{occupied modes below m}), ladder operators on vectors, and
// the expectations a Hadamard-test readout must reproduce.
import { complex, inv, matrix, type Complex as MathComplex } from 'mathjs';
import type { FermionModel } from '../../../src/model/FermionModel.js';
import { denseGround, sectorStates } from '../../helpers/denseFock.js';

export interface Vec {
  re: Float64Array;
  im: Float64Array;
}

/** (a_m or a_m†) v on the 2^n basis. */
export function applyLadder(v: Vec, m: number, dagger: boolean): Vec {
  const out = { re: new Float64Array(v.re.length), im: new Float64Array(v.re.length) };
  for (let s = 0; s < v.re.length; s++) {
    const occupied = ((s >> m) & 1) === 1;
    if (occupied === dagger) continue;
    let below = 0;
    for (let q = 0; q < m; q++) below += (s >> q) & 1;
    const sign = below % 2 === 0 ? 1 : -1;
    out.re[s ^ (1 << m)] += sign * v.re[s]!;
    out.im[s ^ (1 << m)] += sign * v.im[s]!;
  }
  return out;
}

/** H v on the whole Fock space: Σ T_ij a_i† a_j v + ½ Σ V_ijkl a_i† a_j† a_l a_k v. */
export function applyHamiltonian(model: FermionModel, v: Vec): Vec {
  const n = model.modes;
  const out = { re: new Float64Array(v.re.length), im: new Float64Array(v.re.length) };
  const add = (w: Vec, cr: number, ci: number): void => {
    for (let s = 0; s < w.re.length; s++) {
      out.re[s] += cr * w.re[s]! - ci * w.im[s]!;
      out.im[s] += cr * w.im[s]! + ci * w.re[s]!;
    }
  };
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const cr = model.oneBody.re[i * n + j]!;
      const ci = model.oneBody.im[i * n + j]!;
      if (cr !== 0 || ci !== 0) add(applyLadder(applyLadder(v, j, false), i, true), cr, ci);
    }
  }
  for (const t of model.twoBody) {
    add(applyLadder(applyLadder(applyLadder(applyLadder(v, t.k, false), t.l, false), t.j, true), t.i, true), 0.5 * t.re, 0.5 * t.im);
  }
  return out;
}

/** <u|v>. */
export function inner(u: Vec, v: Vec): { re: number; im: number } {
  let re = 0;
  let im = 0;
  for (let s = 0; s < u.re.length; s++) {
    re += u.re[s]! * v.re[s]! + u.im[s]! * v.im[s]!;
    im += u.re[s]! * v.im[s]! - u.im[s]! * v.re[s]!;
  }
  return { re, im };
}

/** The ground level of the model's N-electron sector (dense mathjs diagonalisation) as full-basis vectors. */
export function denseGroundVectors(model: FermionModel): { energy: number; vectors: Vec[] } {
  const ground = denseGround(model, model.electrons);
  const states = sectorStates(model.modes, model.electrons);
  const vectors = ground.states.map((psi) => {
    const v = { re: new Float64Array(2 ** model.modes), im: new Float64Array(2 ** model.modes) };
    states.forEach((s, k) => {
      v.re[s] = psi[k]!.re;
      v.im[s] = psi[k]!.im;
    });
    return v;
  });
  return { energy: ground.energy, vectors };
}

/**
 * The readout's quantity with the shifted Hamiltonian w − H in place of the resolvent, averaged over `vectors`:
 * <a_i†ψ|(w⁺ − H)|a_j†ψ> − <a_jψ|(w⁻ − H)|a_iψ>, w⁺ = z + E0, w⁻ = E0 − z.
 */
export function shiftedReadout(model: FermionModel, vectors: readonly Vec[], E0: number, pair: [number, number], z: { re: number; im: number }): {
  particle: { re: number; im: number };
  hole: { re: number; im: number };
} {
  const [i, j] = pair;
  const particle = { re: 0, im: 0 };
  const hole = { re: 0, im: 0 };
  const bracket = (u: Vec, v: Vec, w: { re: number; im: number }): { re: number; im: number } => {
    const uv = inner(u, v);
    const uhv = inner(u, applyHamiltonian(model, v));
    return { re: w.re * uv.re - w.im * uv.im - uhv.re, im: w.re * uv.im + w.im * uv.re - uhv.im };
  };
  for (const psi of vectors) {
    if (model.electrons < model.modes) {
      const b = bracket(applyLadder(psi, i, true), applyLadder(psi, j, true), { re: z.re + E0, im: z.im });
      particle.re += b.re / vectors.length;
      particle.im += b.im / vectors.length;
    }
    if (model.electrons > 0) {
      const b = bracket(applyLadder(psi, j, false), applyLadder(psi, i, false), { re: E0 - z.re, im: -z.im });
      hole.re -= b.re / vectors.length;
      hole.im -= b.im / vectors.length;
    }
  }
  return { particle, hole };
}

/**
 * The two parts of G_ij(z) with true resolvents (mathjs inverse of w − H on the whole Fock space), averaged over
 * `vectors`: particle <a_i†ψ|(w⁺ − H)⁻¹|a_j†ψ>, hole −<a_jψ|(w⁻ − H)⁻¹|a_iψ> (CONVENTIONS.md).
 */
export function denseGreenParts(model: FermionModel, vectors: readonly Vec[], E0: number, pair: [number, number], z: { re: number; im: number }): {
  particle: { re: number; im: number };
  hole: { re: number; im: number };
} {
  const dim = 2 ** model.modes;
  const columns = Array.from({ length: dim }, (_, c) => {
    const e = { re: new Float64Array(dim), im: new Float64Array(dim) };
    e.re[c] = 1;
    return applyHamiltonian(model, e);
  });
  const resolvent = (w: { re: number; im: number }) =>
    inv(matrix(Array.from({ length: dim }, (_, r) => Array.from({ length: dim }, (_, c) =>
      complex((r === c ? w.re : 0) - columns[c]!.re[r]!, (r === c ? w.im : 0) - columns[c]!.im[r]!))))).toArray() as unknown as MathComplex[][];
  const apply = (R: MathComplex[][], v: Vec): Vec => {
    const out = { re: new Float64Array(dim), im: new Float64Array(dim) };
    for (let r = 0; r < dim; r++) {
      for (let c = 0; c < dim; c++) {
        out.re[r] += R[r]![c]!.re * v.re[c]! - R[r]![c]!.im * v.im[c]!;
        out.im[r] += R[r]![c]!.re * v.im[c]! + R[r]![c]!.im * v.re[c]!;
      }
    }
    return out;
  };
  const [i, j] = pair;
  const Rp = resolvent({ re: z.re + E0, im: z.im });
  const Rh = resolvent({ re: E0 - z.re, im: -z.im });
  const particle = { re: 0, im: 0 };
  const hole = { re: 0, im: 0 };
  for (const psi of vectors) {
    const p = inner(applyLadder(psi, i, true), apply(Rp, applyLadder(psi, j, true)));
    const h = inner(applyLadder(psi, j, false), apply(Rh, applyLadder(psi, i, false)));
    particle.re += p.re / vectors.length;
    particle.im += p.im / vectors.length;
    hole.re -= h.re / vectors.length;
    hole.im -= h.im / vectors.length;
  }
  return { particle, hole };
}
