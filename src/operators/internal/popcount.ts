// popcount: number of set bits of a non-negative bigint or 32-bit integer.

export function popcount32(v: number): number {
  v = v - ((v >>> 1) & 0x55555555);
  v = (v & 0x33333333) + ((v >>> 2) & 0x33333333);
  return (((v + (v >>> 4)) & 0x0f0f0f0f) * 0x01010101) >>> 24;
}

export function popcountBig(v: bigint): number {
  let count = 0;
  while (v !== 0n) {
    count += popcount32(Number(v & 0xffffffffn));
    v >>= 32n;
  }
  return count;
}
