/** selfEnergy: Σ(z) = G0(z)⁻¹ − G(z)⁻¹ = (z − T) − G(z)⁻¹ (CONVENTIONS.md), from the full G matrix at z. */
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { Complex } from './greensFunction.js';
import { complexInverse } from './internal/complexInverse.js';
import { zMinus } from './nonInteractingGreen.js';

/** @throws RangeError when G(z) is singular */
export function selfEnergy(oneBody: ComplexMatrix, green: ComplexMatrix, z: Complex): ComplexMatrix {
  const inverse = complexInverse(green);
  const out = zMinus(oneBody, z);
  for (let k = 0; k < out.re.length; k++) {
    out.re[k]! -= inverse.re[k]!;
    out.im[k]! -= inverse.im[k]!;
  }
  return out;
}
