// lehmannForm: Hubbard dimer poles and weights, the zeroth and first moment sum rules.
import { describe, expect, it } from 'vitest';
import { lehmannForm } from '../../src/exact/lehmannForm.js';
import type { FermionModel } from '../../src/model/FermionModel.js';
import { expectClose } from '../helpers/close.js';
import { denseGround, sectorStates } from '../helpers/denseFock.js';
import { anderson, hubbard, randomModel } from '../helpers/models.js';

/** ρ_qs = ⟨a_q† a_s⟩ averaged over the ground level, from the independent dense reference. */
function density(model: FermionModel): { re: number; im: number }[][] {
  const n = model.modes;
  const g = denseGround(model, model.electrons);
  const states = sectorStates(n, model.electrons);
  const index = new Map(states.map((s, k) => [s, k]));
  const rho = Array.from({ length: n }, () => Array.from({ length: n }, () => ({ re: 0, im: 0 })));
  const parity = (s: number, m: number): number => {
    let c = 0;
    for (let q = 0; q < m; q++) c += (s >> q) & 1;
    return c % 2 ? -1 : 1;
  };
  for (const psi of g.states) {
    states.forEach((st, k) => {
      for (let s = 0; s < n; s++) {
        if (!((st >> s) & 1)) continue;
        const mid = st ^ (1 << s);
        for (let q = 0; q < n; q++) {
          if ((mid >> q) & 1) continue;
          const out = mid | (1 << q);
          const sign = parity(st, s) * parity(mid, q);
          const row = index.get(out)!;
          // ⟨ψ|a_q† a_s|ψ⟩ = Σ conj(ψ_row) sign ψ_k
          rho[q]![s]!.re += (sign * (psi[row]!.re * psi[k]!.re + psi[row]!.im * psi[k]!.im)) / g.states.length;
          rho[q]![s]!.im += (sign * (psi[row]!.re * psi[k]!.im - psi[row]!.im * psi[k]!.re)) / g.states.length;
        }
      }
    });
  }
  return rho;
}

describe('lehmannForm(model)', () => {
  it('gives the Hubbard dimer G_00 poles ±(c/2 − t), ±(c/2 + t) with weights (1 ± 4t/c)/4', () => {
    const t = 1;
    const U = 4;
    const form = lehmannForm(hubbard({ sites: 2, hopping: t, interaction: U, chemicalPotential: U / 2, spin: 0 }));
    const c = Math.sqrt(U * U + 16 * t * t);
    const weighted = form.poles.filter((p) => p.residue.re[0]! > 1e-12);
    // Standard textbook result, from memory; verified here against full diagonalisation.
    const expected = [
      [-(c / 2 + t), (1 - (4 * t) / c) / 4],
      [-(c / 2 - t), (1 + (4 * t) / c) / 4],
      [c / 2 - t, (1 + (4 * t) / c) / 4],
      [c / 2 + t, (1 - (4 * t) / c) / 4],
    ];
    expect(weighted.length).toBe(4);
    weighted.forEach((p, k) => {
      expectClose(p.energy, expected[k]![0]!, 1e-10, `pole ${k}`);
      expectClose(p.residue.re[0]!, expected[k]![1]!, 1e-10, `weight ${k}`);
    });
  });

  it('satisfies Σ_p R^p_ii = 1 and Σ_p ε_p R^p_ii = ⟨{[a_i, H], a_i†}⟩ computed from T, V and ρ', () => {
    const models = [
      randomModel(11, 5, 2, true),
      randomModel(12, 6, 3, false),
      anderson(-1, 2, [{ level: 0.3, coupling: 0.5 }], 0, 2),
    ];
    for (const model of models) {
      const n = model.modes;
      const form = lehmannForm(model);
      const rho = density(model);
      const V = new Map(model.twoBody.map((t) => [`${t.i},${t.j},${t.k},${t.l}`, t.re]));
      const v = (i: number, j: number, k: number, l: number): number => V.get(`${i},${j},${k},${l}`) ?? 0;
      for (let i = 0; i < n; i++) {
        let m0 = 0;
        let m1 = 0;
        for (const p of form.poles) {
          m0 += p.residue.re[i * n + i]!;
          m1 += p.energy * p.residue.re[i * n + i]!;
        }
        // Anticommutator {a_i, a_i†} = 1 (common practice: the spectral sum rule).
        expectClose(m0, 1, 1e-10, `zeroth moment ${i}`);
        // First moment (common practice, derived by hand from CONVENTIONS.md's H):
        // {[a_i,H],a_i†} = T_ii + ½ Σ_qs (V_iqis − V_qiis − V_iqsi + V_qisi) a_q† a_s; V real in the real part used here.
        let expected = model.oneBody.re[i * n + i]!;
        for (let q = 0; q < n; q++) {
          for (let s = 0; s < n; s++) {
            const c = 0.5 * (v(i, q, i, s) - v(q, i, i, s) - v(i, q, s, i) + v(q, i, s, i));
            expected += c * rho[q]![s]!.re;
          }
        }
        const imagV = model.twoBody.some((t) => t.im !== 0);
        if (!imagV) expectClose(m1, expected, 1e-9, `first moment ${i}`);
      }
    }
  });
});
