/** randomVector: a seeded random unit-free vector with entries uniform in [−1, 1) (complex optional). */
import { seededRandom } from '../../core/seededRandom.js';
import { zeroVec, type CVec } from './vec.js';

export function randomVector(dim: number, complex: boolean, seed: number): CVec {
  const random = seededRandom(seed);
  const v = zeroVec(dim, complex);
  for (let k = 0; k < dim; k++) v.re[k] = 2 * random.next() - 1;
  if (v.im !== null) for (let k = 0; k < dim; k++) v.im[k] = 2 * random.next() - 1;
  return v;
}
