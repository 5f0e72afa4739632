// latticeBonds: nearest-neighbour site pairs of a chain, ring or grid (sites row-major, x fastest), each bond once.

/**
 * A ring of L ≤ 2 sites has the bonds of the chain (the wrap-around bond would repeat the bond 0–1, or be a
 * self-loop for L = 1); a periodic grid direction of length ≤ 2 likewise adds no wrap-around bond.
 */
export function latticeBonds(shape: 'chain' | 'ring' | 'grid', size: readonly number[], periodic: readonly boolean[]): [number, number][] {
  if (shape !== 'grid') return lineBonds(size[0]!, shape === 'ring');
  const [lx, ly] = size as [number, number];
  const bonds: [number, number][] = [];
  for (let y = 0; y < ly; y++) for (const [a, b] of lineBonds(lx, periodic[0]!)) bonds.push([a + lx * y, b + lx * y]);
  for (let x = 0; x < lx; x++) for (const [a, b] of lineBonds(ly, periodic[1]!)) bonds.push([x + lx * a, x + lx * b]);
  return bonds;
}

function lineBonds(length: number, wrap: boolean): [number, number][] {
  const bonds: [number, number][] = [];
  for (let s = 0; s + 1 < length; s++) bonds.push([s, s + 1]);
  if (wrap && length > 2) bonds.push([length - 1, 0]);
  return bonds;
}
