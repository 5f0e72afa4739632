// onSiteInteraction: U n_p n_q for two distinct modes p, q, written as V terms of ½ Σ V_ijkl a†i a†j a_l a_k.
import type { TwoBodyTerm } from '../FermionModel.js';

/**
 * n_p n_q = a†p a†q a_q a_p (p ≠ q, two anticommutations), which is ½ (V_pqpq a†p a†q a_q a_p + V_qpqp a†q a†p a_p a_q)
 * with V_pqpq = V_qpqp = U; both entries are listed so V keeps the symmetry V_ijkl = V_jilk.
 */
export function onSiteInteraction(p: number, q: number, u: number): TwoBodyTerm[] {
  if (u === 0) return [];
  return [
    { i: p, j: q, k: p, l: q, re: u, im: 0 },
    { i: q, j: p, k: q, l: p, re: u, im: 0 },
  ];
}
