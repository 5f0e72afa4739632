/**
 * spinRotationInvariant: whether H commutes with S⁺ = Σ_s a†_{s↑} a_{s↓} (then, H being Hermitian,
 * with S⁻ and S_z too: H is SU(2) invariant). Decided symbolically from T and V: the commutator is a
 * one- plus two-body operator whose normal-ordered coefficients must all vanish. Uses
 * [a†p, a†u a_v] = −δ_pv a†u and [a_r, a†u a_v] = δ_ru a_v (common practice).
 */
import type { FermionModel } from '../../model/FermionModel.js';

/** Relative size, against the largest coefficient of H, below which a commutator coefficient counts as zero. */
const ZERO = 1e-12;

export function spinRotationInvariant(model: FermionModel): boolean {
  const blocks = model.spinBlocks;
  if (blocks === undefined || blocks.up.length !== blocks.down.length) return false;
  const n = model.modes;
  const T = model.oneBody;
  const raising = blocks.up.map((u, s): [number, number] => [u, blocks.down[s]!]);
  let scale = 0;
  for (let e = 0; e < n * n; e++) scale = Math.max(scale, Math.hypot(T.re[e]!, T.im[e]!));
  for (const t of model.twoBody) scale = Math.max(scale, Math.hypot(t.re, t.im));
  const tol = ZERO * Math.max(scale, 1e-300);

  // [a†i a_j, a†u a_v] = δ_ju a†i a_v − δ_iv a†u a_j
  const one = new Map<string, [number, number]>();
  const addOne = (p: number, q: number, re: number, im: number): void => {
    const key = `${p},${q}`;
    const c = one.get(key) ?? [0, 0];
    one.set(key, [c[0] + re, c[1] + im]);
  };
  for (const [u, v] of raising) {
    for (let i = 0; i < n; i++) {
      const tiu = i * n + u;
      if (T.re[tiu] !== 0 || T.im[tiu] !== 0) addOne(i, v, T.re[tiu]!, T.im[tiu]!);
      const tvi = v * n + i;
      if (T.re[tvi] !== 0 || T.im[tvi] !== 0) addOne(u, i, -T.re[tvi]!, -T.im[tvi]!);
    }
  }

  // ½ V_ijkl a†i a†j a_l a_k; [a†p a†q a_s a_r, a†u a_v] =
  //   −δ_pv a†u a†q a_s a_r − δ_qv a†p a†u a_s a_r + δ_su a†p a†q a_v a_r + δ_ru a†p a†q a_s a_v
  const two = new Map<string, [number, number]>();
  const addTwo = (p: number, q: number, s: number, r: number, re: number, im: number): void => {
    if (p === q || s === r) return;
    // canonical a†p a†q a_s a_r with p < q and r < s
    let sign = 1;
    if (p > q) [p, q, sign] = [q, p, -sign];
    if (r > s) [r, s, sign] = [s, r, -sign];
    const key = `${p},${q},${s},${r}`;
    const c = two.get(key) ?? [0, 0];
    two.set(key, [c[0] + sign * re, c[1] + sign * im]);
  };
  for (const [u, v] of raising) {
    for (const { i: p, j: q, k: r, l: s, re, im } of model.twoBody) {
      const hr = re / 2;
      const hi = im / 2;
      if (p === v) addTwo(u, q, s, r, -hr, -hi);
      if (q === v) addTwo(p, u, s, r, -hr, -hi);
      if (s === u) addTwo(p, q, v, r, hr, hi);
      if (r === u) addTwo(p, q, s, v, hr, hi);
    }
  }
  for (const [re, im] of [...one.values(), ...two.values()]) if (Math.hypot(re, im) > tol) return false;
  return true;
}
