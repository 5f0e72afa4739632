/**
 * shiftedEncoding: w·I − M for a complex w, as the linear combination of the identity and M;
 * α = |w| + α_M.
 */
import type { BlockEncoding } from '../BlockEncoding.js';
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';
import { identityEncoding } from './identityEncoding.js';
import { linearCombination } from './linearCombination.js';

export function shiftedEncoding(encoding: BlockEncoding, w: ComplexScalar, label = `w − ${encoding.label}`): BlockEncoding {
  return linearCombination(
    [
      { coefficient: w, encoding: identityEncoding(encoding.systemQubits) },
      { coefficient: { re: -1, im: 0 }, encoding },
    ],
    label,
  );
}
