// diagonalTerms: reads a normal-ordered fermion operator as a function of the occupations, B(x) = constant + Σ_p c_p n_p +
// Σ_{p<q} V_pq n_p n_q, or says why it is not one (a term that moves an electron, or a complex diagonal coefficient).
import type { LadderSum } from '../../operators/LadderSum.js';

export interface PairTerm {
  readonly p: number;
  readonly q: number;
  readonly value: number;
}

export interface DiagonalTerms {
  readonly modes: number;
  readonly constant: number;
  /** c_p, one per mode (0 when absent). */
  readonly single: Float64Array;
  /** V_pq for p < q, non-zero entries only, one per pair. */
  readonly pairs: readonly PairTerm[];
}

/** Imaginary parts up to this (relative to the largest coefficient) count as rounding of a Hermitian operator. */
const IMAGINARY_TOLERANCE = 1e-12;

/**
 * For a normal-ordered sum (creators ascending, annihilators descending, as normalOrder writes it): a_p† a_p = n_p and
 * a_p† a_q† a_q a_p = n_p n_q (p < q; moving a_q left past a_p† and a_q† … gives n_p n_q with no sign). Every other
 * product changes some occupation.
 * @returns the terms, or a reason naming the first term that is not diagonal.
 */
export function diagonalTerms(op: LadderSum, modes: number): DiagonalTerms | { readonly notDiagonal: string } {
  let constant = 0;
  const single = new Float64Array(modes);
  const pairs = new Map<number, PairTerm>();
  const scale = Math.max(1, ...op.terms.map((t) => Math.hypot(t.re, t.im)));
  for (const term of op.terms) {
    const o = term.ops;
    const text = o.map((f) => `a${f.dagger ? '†' : ''}${f.mode}`).join(' ') || '1';
    if (Math.abs(term.im) > IMAGINARY_TOLERANCE * scale) return { notDiagonal: `term ${text} has a complex coefficient` };
    if (o.length === 0) constant += term.re;
    else if (o.length === 2 && o[0]!.dagger && !o[1]!.dagger && o[0]!.mode === o[1]!.mode) single[o[0]!.mode] += term.re;
    else if (
      o.length === 4 && o[0]!.dagger && o[1]!.dagger && !o[2]!.dagger && !o[3]!.dagger &&
      o[0]!.mode < o[1]!.mode && o[2]!.mode === o[1]!.mode && o[3]!.mode === o[0]!.mode
    ) {
      const key = o[0]!.mode * modes + o[1]!.mode;
      pairs.set(key, { p: o[0]!.mode, q: o[1]!.mode, value: (pairs.get(key)?.value ?? 0) + term.re });
    } else return { notDiagonal: `term ${text} is not a number operator n_p or a density–density product n_p n_q` };
  }
  return { modes, constant, single, pairs: [...pairs.values()].filter((t) => t.value !== 0) };
}
