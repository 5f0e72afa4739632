// Independent dense reference for the exact solver: the sector Hamiltonian built entry by entry from
// the Jordan–Wigner rules of CONVENTIONS.md, diagonalised and inverted with mathjs.
import { complex, eigs, inv, matrix, type Complex as MathComplex, type Matrix } from 'mathjs';
import type { FermionModel } from '../../src/model/FermionModel.js';

type Amp = { re: number; im: number };

/** a_m (dagger false) or a_m† on a pattern: [new pattern, sign] or null; sign = (−1)^{#occupied below m}. */
function ladder(state: number, m: number, dagger: boolean): [number, number] | null {
  const occupied = ((state >> m) & 1) === 1;
  if (occupied === dagger) return null;
  let below = 0;
  for (let q = 0; q < m; q++) below += (state >> q) & 1;
  return [state ^ (1 << m), below % 2 === 0 ? 1 : -1];
}

function apply(state: number, ops: [number, boolean][]): [number, number] | null {
  let s = state;
  let sign = 1;
  for (let t = ops.length - 1; t >= 0; t--) {
    const r = ladder(s, ops[t]![0], ops[t]![1]);
    if (r === null) return null;
    s = r[0];
    sign *= r[1];
  }
  return [s, sign];
}

/** Patterns with `electrons` bits; with `up`, only those with `up` bits among the low modes 0…modes/2−1. */
export function sectorStates(modes: number, electrons: number, up?: number): number[] {
  const out: number[] = [];
  for (let s = 0; s < 1 << modes; s++) {
    let c = 0;
    let low = 0;
    for (let q = 0; q < modes; q++) {
      c += (s >> q) & 1;
      if (q < modes / 2) low += (s >> q) & 1;
    }
    if (c === electrons && (up === undefined || low === up)) out.push(s);
  }
  return out;
}

/** Dense H in the N-electron sector (with `up`: its S_z sector of `up` low-mode electrons), as rows of {re, im}. */
export function denseHamiltonian(model: FermionModel, electrons: number, up?: number): Amp[][] {
  const n = model.modes;
  const states = sectorStates(n, electrons, up);
  const index = new Map(states.map((s, k) => [s, k]));
  const H = states.map(() => states.map(() => ({ re: 0, im: 0 })));
  states.forEach((s, col) => {
    const add = (ops: [number, boolean][], re: number, im: number): void => {
      if (re === 0 && im === 0) return;
      const r = apply(s, ops);
      if (r === null) return;
      const row = index.get(r[0]);
      if (row === undefined) throw new Error('denseHamiltonian: H leaves the requested S_z sector');
      H[row]![col]!.re += r[1] * re;
      H[row]![col]!.im += r[1] * im;
    };
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) add([[i, true], [j, false]], model.oneBody.re[i * n + j]!, model.oneBody.im[i * n + j]!);
    }
    for (const t of model.twoBody) add([[t.i, true], [t.j, true], [t.l, false], [t.k, false]], 0.5 * t.re, 0.5 * t.im);
  });
  return H;
}

/** Ground energy and an orthonormal ground-level basis (mathjs eigs on the real embedding); `up` as in denseHamiltonian. */
export function denseGround(model: FermionModel, electrons: number, tol = 1e-8, up?: number): { energy: number; states: Amp[][]; values: number[] } {
  const H = denseHamiltonian(model, electrons, up);
  const d = H.length;
  const big: number[][] = [];
  for (let r = 0; r < 2 * d; r++) {
    const row: number[] = [];
    for (let c = 0; c < 2 * d; c++) {
      const a = H[r % d]![c % d]!;
      const top = r < d;
      const left = c < d;
      row.push(top === left ? a.re : top ? -a.im : a.im);
    }
    big.push(row);
  }
  const result = eigs(big);
  const values = (Array.isArray(result.values) ? result.values : (result.values as Matrix).toArray()) as number[];
  const e0 = Math.min(...values);
  const vecs = result.eigenvectors
    .filter((v) => (v.value as number) - e0 <= tol * Math.max(1, Math.abs(e0)))
    .map((v) => (Array.isArray(v.vector) ? v.vector : (v.vector as Matrix).toArray()) as number[]);
  // The embedding doubles each complex vector (x, y) ~ (−y, x): Gram–Schmidt the complex x + iy.
  const basis: Amp[][] = [];
  for (const v of vecs) {
    const c = Array.from({ length: d }, (_, k) => ({ re: v[k]!, im: v[k + d]! }));
    for (const b of basis) {
      let pr = 0;
      let pi = 0;
      for (let k = 0; k < d; k++) {
        pr += b[k]!.re * c[k]!.re + b[k]!.im * c[k]!.im;
        pi += b[k]!.re * c[k]!.im - b[k]!.im * c[k]!.re;
      }
      for (let k = 0; k < d; k++) {
        c[k]!.re -= pr * b[k]!.re - pi * b[k]!.im;
        c[k]!.im -= pr * b[k]!.im + pi * b[k]!.re;
      }
    }
    const size = Math.sqrt(c.reduce((s, a) => s + a.re * a.re + a.im * a.im, 0));
    if (size > 1e-6) basis.push(c.map((a) => ({ re: a.re / size, im: a.im / size })));
  }
  return { energy: e0, states: basis, values: values.slice().sort((a, b) => a - b) };
}

/**
 * G_ij(z) for all i, j from the resolvents (z ∓ (H − E0))⁻¹ of the whole N±1 sectors (mathjs inv), averaged
 * over the ground level of the whole N-electron sector — or, with `up`, of its S_z sector of `up` low-mode electrons.
 */
export function denseGreen(model: FermionModel, z: Amp, up?: number): { re: number; im: number }[][] {
  const n = model.modes;
  const N = model.electrons;
  const ground = denseGround(model, N, 1e-8, up);
  const states = sectorStates(n, N, up);
  const G = Array.from({ length: n }, () => Array.from({ length: n }, () => ({ re: 0, im: 0 })));
  for (const particle of [true, false]) {
    const M = N + (particle ? 1 : -1);
    if (M < 0 || M > n) continue;
    const target = sectorStates(n, M);
    const index = new Map(target.map((s, k) => [s, k]));
    const H = denseHamiltonian(model, M);
    const s = particle ? -1 : 1;
    const A = H.map((row, r) =>
      row.map((a, c) => complex((r === c ? z.re : 0) + s * (a.re - (r === c ? ground.energy : 0)), (r === c ? z.im : 0) + s * a.im)),
    );
    const R = inv(matrix(A)).toArray() as unknown as MathComplex[][];
    for (const psi of ground.states) {
      // phi[m][row] = (a_m† or a_m)|ψ⟩
      const phi = Array.from({ length: n }, (_, m) => {
        const v = target.map(() => ({ re: 0, im: 0 }));
        states.forEach((st, k) => {
          const r = ladder(st, m, particle);
          if (r === null) return;
          const row = index.get(r[0])!;
          v[row]!.re += r[1] * psi[k]!.re;
          v[row]!.im += r[1] * psi[k]!.im;
        });
        return v;
      });
      const bracket = (u: Amp[], v: Amp[]): Amp => {
        let re = 0;
        let im = 0;
        for (let r = 0; r < u.length; r++) {
          let tr = 0;
          let ti = 0;
          for (let c = 0; c < v.length; c++) {
            const x = R[r]![c]!;
            tr += x.re * v[c]!.re - x.im * v[c]!.im;
            ti += x.re * v[c]!.im + x.im * v[c]!.re;
          }
          re += u[r]!.re * tr + u[r]!.im * ti;
          im += u[r]!.re * ti - u[r]!.im * tr;
        }
        return { re, im };
      };
      for (let i = 0; i < n; i++) {
        for (let j = 0; j < n; j++) {
          // G⁺_ij = ⟨a_i†ψ|R|a_j†ψ⟩, G⁻_ij = ⟨a_jψ|R|a_iψ⟩
          const b = particle ? bracket(phi[i]!, phi[j]!) : bracket(phi[j]!, phi[i]!);
          G[i]![j]!.re += b.re / ground.states.length;
          G[i]![j]!.im += b.im / ground.states.length;
        }
      }
    }
  }
  return G;
}
