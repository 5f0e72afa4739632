/**
 * serialSteps: the Lanczos step operations on one thread from a plain product y = H x, for complex
 * vectors and for Hamiltonians without a fused real kernel.
 */
import type { CompactVec, LanczosSteps, LinearTerm, Projection } from './lanczos.js';
import { axpy, dot, norm, type CVec } from './vec.js';

export function serialSteps(apply: (x: CVec, y: CVec) => void): LanczosSteps {
  return {
    step(x: CVec, c: number, y: CVec, s: number, z: CVec): number {
      apply(x, y);
      const yr = y.re;
      const zr = z.re;
      for (let k = 0; k < yr.length; k++) yr[k] = c * yr[k]! + -s * zr[k]!;
      if (y.im !== null) {
        const yi = y.im;
        const zi = z.im;
        for (let k = 0; k < yi.length; k++) yi[k] = c * yi[k]! + (zi === null ? 0 : -s * zi[k]!);
      }
      return dot(x, y)[0];
    },
    update(terms: readonly LinearTerm[], w: CVec, against: readonly CVec[], copy: CompactVec | null): Projection {
      for (const term of terms) axpy(-term.re, -term.im, term.v, w);
      if (copy !== null) {
        copy.re.set(w.re);
        if (copy.im !== null && w.im !== null) copy.im.set(w.im);
      }
      const size = norm(w);
      return { normSquared: size * size, overlaps: against.map((q) => dot(q, w)) };
    },
  };
}
