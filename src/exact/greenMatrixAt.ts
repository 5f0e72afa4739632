/** greenMatrixAt: the full n×n matrix G(z) at one arbitrary complex z (off the poles). */
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel } from '../model/FermionModel.js';
import type { GroundLevel } from './groundLevel.js';
import { greensFunction, type Complex, type GreenOptions } from './greensFunction.js';

export function greenMatrixAt(
  model: FermionModel,
  ground: GroundLevel,
  z: Complex,
  options: Omit<GreenOptions, 'z' | 'pairs'> = {},
): ComplexMatrix {
  const n = model.modes;
  const result = greensFunction(model, ground, { ...options, z: [z] });
  const re = new Float64Array(n * n);
  const im = new Float64Array(n * n);
  for (const e of result.entries) {
    re[e.i * n + e.j] = e.re[0]!;
    im[e.i * n + e.j] = e.im[0]!;
  }
  return { n, re, im };
}
