// checkTwoBodyHermitian: ½ Σ V_ijkl a†i a†j a_l a_k must be Hermitian as an operator, judged on its normal-ordered form.
import { HERMITIAN_TOLERANCE } from './checkOneBodyHermitian.js';
import { formatComplex } from './formatComplex.js';
import type { Problem } from './Problem.js';
import type { TwoBodyTerm } from '../FermionModel.js';

export interface PositionedTwoBody extends TwoBodyTerm {
  /** Row of the input list this entry came from. */
  readonly position: number;
}

interface Canonical {
  re: number;
  im: number;
  readonly positions: number[];
}

/**
 * Rewrites every entry as a multiple of a†p a†q a_s a_r with p < q and r < s (anticommutation gives the
 * sign; i = j or k = l vanishes) and requires c(p,q,r,s) = conj(c(r,s,p,q)), since
 * (a†p a†q a_s a_r)† = a†r a†s a_q a_p. Equivalent inputs (e.g. V_ijkl given as −V_jikl) are thus accepted.
 */
export function checkTwoBodyHermitian(entries: readonly PositionedTwoBody[], field: string, problems: Problem[]): void {
  const canonical = new Map<string, Canonical>();
  let scale = 1;
  for (const e of entries) {
    scale = Math.max(scale, Math.hypot(e.re, e.im));
    if (e.i === e.j || e.k === e.l) continue;
    const sign = (e.i < e.j ? 1 : -1) * (e.k < e.l ? 1 : -1);
    const key = [Math.min(e.i, e.j), Math.max(e.i, e.j), Math.min(e.k, e.l), Math.max(e.k, e.l)].join(',');
    let c = canonical.get(key);
    if (c === undefined) {
      c = { re: 0, im: 0, positions: [] };
      canonical.set(key, c);
    }
    c.re += (sign * e.re) / 2;
    c.im += (sign * e.im) / 2;
    c.positions.push(e.position);
  }
  const tol = HERMITIAN_TOLERANCE * scale;
  const reported = new Set<string>();
  for (const [key, c] of canonical) {
    const [p, q, r, s] = key.split(',').map(Number) as [number, number, number, number];
    const partnerKey = [r, s, p, q].join(',');
    if (reported.has(key)) continue;
    const partner = canonical.get(partnerKey) ?? { re: 0, im: 0, positions: [] };
    if (Math.hypot(c.re - partner.re, c.im + partner.im) <= tol) continue;
    reported.add(partnerKey);
    const positions = [...new Set([...c.positions, ...partner.positions])].sort((a, b) => a - b);
    const from = positions.map((n) => `${field}[${n}]`).join(', ');
    const message = key === partnerKey
      ? `not Hermitian: the normal-ordered coefficient of a†${p} a†${q} a${s} a${r} is ` +
        `${formatComplex(c.re, c.im)}, which must be real (from ${from})`
      : `not Hermitian: the normal-ordered coefficient of a†${p} a†${q} a${s} a${r} is ` +
        `${formatComplex(c.re, c.im)} but its adjoint a†${r} a†${s} a${q} a${p} has ` +
        `${formatComplex(partner.re, partner.im)}; they must be complex conjugates (from ${from})`;
    problems.push({ path: [field], message });
  }
}
