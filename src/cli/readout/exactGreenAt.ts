/** exactGreenAt: the exact solver's G_ij(z) at one z, with its continued-fraction truncation bound. */
import { greensFunction } from '../../exact/greensFunction.js';
import type { GroundLevel } from '../../exact/groundLevel.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import type { FermionModel } from '../../model/FermionModel.js';

export interface ExactValue {
  readonly value: ComplexScalar;
  readonly bound: number;
}

/** G_ij at every z of the list (one continued-fraction pass for all of them). */
export function exactGreenAt(model: FermionModel, level: GroundLevel, pair: readonly [number, number], z: readonly ComplexScalar[]): ExactValue[] {
  const entry = greensFunction(model, level, { z, pairs: [pair] }).entries[0]!;
  return z.map((_, k) => ({ value: { re: entry.re[k]!, im: entry.im[k]! }, bound: entry.bound[k]! }));
}
