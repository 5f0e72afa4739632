// modelHamiltonian: the LadderSum of a model's H, or of its split parts A (one-body) and B (the rest).
import type { FermionModel } from '../model/FermionModel.js';
import type { LadderSum, LadderTerm } from './LadderSum.js';
import { normalOrder } from './normalOrder.js';

/**
 * H = Σ T_ij a_i† a_j + ½ Σ V_ijkl a_i† a_j† a_l a_k, returned normal-ordered (see normalOrder).
 * @param options.part 'all' (default) for H; 'A' for Σ (T − T_B)_ij a_i† a_j; 'B' for Σ (T_B)_ij a_i† a_j plus
 *        the two-body part, where T_B is model.oneBodyInB. A + B = H.
 */
export function modelHamiltonian(model: FermionModel, options: { part?: 'all' | 'A' | 'B' } = {}): LadderSum {
  const part = options.part ?? 'all';
  const n = model.modes;
  const terms: LadderTerm[] = [];
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      const e = i * n + j;
      const inB = { re: model.oneBodyInB.re[e]!, im: model.oneBodyInB.im[e]! };
      const c = part === 'all' ? { re: model.oneBody.re[e]!, im: model.oneBody.im[e]! }
        : part === 'B' ? inB
        : { re: model.oneBody.re[e]! - inB.re, im: model.oneBody.im[e]! - inB.im };
      if (c.re === 0 && c.im === 0) continue;
      terms.push({ ops: [{ mode: i, dagger: true }, { mode: j, dagger: false }], re: c.re, im: c.im });
    }
  }
  if (part !== 'A') {
    for (const v of model.twoBody) {
      const ops = [
        { mode: v.i, dagger: true },
        { mode: v.j, dagger: true },
        { mode: v.l, dagger: false },
        { mode: v.k, dagger: false },
      ];
      terms.push({ ops, re: v.re / 2, im: v.im / 2 });
    }
  }
  return normalOrder({ terms });
}
