/** Bit helpers for occupation patterns held in 32-bit integers (≤ 30 modes). */

/** Number of set bits of a non-negative 32-bit integer. */
export function popcount(x: number): number {
  let v = x - ((x >>> 1) & 0x55555555);
  v = (v & 0x33333333) + ((v >>> 2) & 0x33333333);
  return (((v + (v >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
}

/**
 * Applies a product of ladder operators, rightmost first, to the occupation pattern `state`.
 * `ops` lists [mode, dagger] pairs in written order (left to right). Returns the new pattern and
 * the Jordan–Wigner sign (−1)^{#occupied modes below each acted-on mode}, or sign 0 when it vanishes.
 */
export function applyLadders(state: number, ops: readonly (readonly [number, boolean])[]): [number, number] {
  let s = state;
  let sign = 1;
  for (let t = ops.length - 1; t >= 0; t--) {
    const [mode, dagger] = ops[t]!;
    const bit = 1 << mode;
    const occupied = (s & bit) !== 0;
    if (occupied === dagger) return [0, 0];
    if (popcount(s & (bit - 1)) & 1) sign = -sign;
    s ^= bit;
  }
  return [s, sign];
}
