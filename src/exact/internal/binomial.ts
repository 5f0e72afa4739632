/** binomial(n, k): C(n, k) as an exact number for the sizes a Fock sector can have (n ≤ 62). */
export function binomial(n: number, k: number): number {
  if (k < 0 || k > n) return 0;
  let kk = Math.min(k, n - k);
  let value = 1;
  for (let t = 1; t <= kk; t++) value = (value * (n - kk + t)) / t;
  return Math.round(value);
}
