// ladder: the single ladder operator a_mode (dagger false) or a†_mode (dagger true) as a FermionOperator.
import type { FermionOperator } from './FermionOperator.js';
import { fermionProduct } from './fermionProduct.js';

/** a_mode, or a†_mode when `dagger` is true. */
export function ladder(mode: number, dagger: boolean): FermionOperator {
  return fermionProduct([{ mode, dagger }]);
}
