/**
 * outcomeKey: a classical bit array written as the outcome's bitstring, most significant (highest
 * bit index) first, so classical bit k is bit k of the outcome.
 */

export function outcomeKey(bits: Uint8Array): string {
  let key = '';
  for (let k = bits.length - 1; k >= 0; k--) key += bits[k] === 1 ? '1' : '0';
  return key;
}
