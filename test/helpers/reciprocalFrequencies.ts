// reciprocalFrequencies: every ν of a plane-wave grid written out independently of the code under test — per axis the
// n integers −⌊(n−1)/2⌋ … ⌊n/2⌋, first dimension slowest in the list (order does not matter to the sums using it).
export function reciprocalFrequencies(points: readonly number[]): number[][] {
  let all: number[][] = [[]];
  for (const n of points) {
    const axis = Array.from({ length: n }, (_, s) => s - Math.floor((n - 1) / 2));
    all = all.flatMap((nu) => axis.map((v) => [...nu, v]));
  }
  return all;
}
