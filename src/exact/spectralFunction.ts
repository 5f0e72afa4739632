/** spectralFunction: A(ω) = −(1/π) Im G(ω + iη) for the values of one Green's-function entry. */
import type { GreenEntry } from './greensFunction.js';

export function spectralFunction(entry: GreenEntry): Float64Array {
  return entry.im.map((x) => -x / Math.PI);
}
