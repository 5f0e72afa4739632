/**
 * qspMatrixElement: ⟨0|U(x)|0⟩ for U(x) = e^{iφ_0 Z} Π_{k=1..d} [W(x) e^{iφ_k Z}],
 * W(x) = [[x, i√(1−x²)], [i√(1−x²), x]] (the Wx convention of Gilyén, Su, Low & Wiebe, STOC 2019, and
 * Martyn, Rossi, Tan & Chuang, PRX Quantum 2, 040203, 2021), by the direct product of the row ⟨0| with
 * every factor in turn; O(d), no symmetry assumed. The rounding of √(1−x²) is compensated so the
 * factors W are exactly unitary (see internal/signalNormDrift.ts).
 */
import { signalNormCorrection } from './internal/signalNormDrift.js';

export function qspMatrixElement(phases: Float64Array, x: number): { re: number; im: number } {
  if (phases.length === 0) throw new RangeError('qspMatrixElement: at least one phase is needed');
  if (!(Math.abs(x) <= 1)) throw new RangeError(`qspMatrixElement: x must be in [−1, 1], got ${x}`);
  const s = Math.sqrt((1 - x) * (1 + x));
  // The row (a, b) = ⟨0| e^{iφ_0 Z} W e^{iφ_1 Z} …, a = aRe + i aIm, b = bRe + i bIm.
  let aRe = Math.cos(phases[0]!);
  let aIm = Math.sin(phases[0]!);
  let bRe = 0;
  let bIm = 0;
  for (let k = 1; k < phases.length; k++) {
    // (a, b) ← (a, b) W = (x a + i s b, i s a + x b)
    const nextARe = x * aRe - s * bIm;
    const nextAIm = x * aIm + s * bRe;
    const nextBRe = x * bRe - s * aIm;
    const nextBIm = x * bIm + s * aRe;
    // (a, b) ← (a e^{iφ}, b e^{−iφ})
    const c = Math.cos(phases[k]!);
    const sn = Math.sin(phases[k]!);
    aRe = nextARe * c - nextAIm * sn;
    aIm = nextARe * sn + nextAIm * c;
    bRe = nextBRe * c + nextBIm * sn;
    bIm = nextBIm * c - nextBRe * sn;
  }
  const correction = signalNormCorrection(x, s, phases.length - 1);
  return { re: aRe * correction, im: aIm * correction };
}
