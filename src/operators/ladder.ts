// ladder: the single ladder operator a_mode (dagger false) or a†_mode (dagger true) as a LadderSum.
import type { LadderSum } from './LadderSum.js';
import { fermionProduct } from './fermionProduct.js';

/** a_mode, or a†_mode when `dagger` is true. */
export function ladder(mode: number, dagger: boolean): LadderSum {
  return fermionProduct([{ mode, dagger }]);
}
