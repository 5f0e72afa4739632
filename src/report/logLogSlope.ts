/**
 * logLogSlope: the least-squares slope of log y against log x — the fitted exponent b of y ≈ a·x^b that `cost --vary`
 * reports for each route (common practice for reading scaling from a sweep). Null for fewer than two points or a
 * non-positive value, where no exponent is defined.
 */
export function logLogSlope(x: readonly number[], y: readonly number[]): number | null {
  if (x.length !== y.length) throw new RangeError(`logLogSlope: ${x.length} x values but ${y.length} y values`);
  if (x.length < 2 || [...x, ...y].some((v) => !(v > 0) || !Number.isFinite(v))) return null;
  const lx = x.map(Math.log);
  const ly = y.map(Math.log);
  const mx = lx.reduce((a, b) => a + b, 0) / lx.length;
  const my = ly.reduce((a, b) => a + b, 0) / ly.length;
  let sxx = 0;
  let sxy = 0;
  lx.forEach((v, k) => {
    sxx += (v - mx) ** 2;
    sxy += (v - mx) * (ly[k]! - my);
  });
  return sxx === 0 ? null : sxy / sxx;
}
