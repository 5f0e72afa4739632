/**
 * signalNormDrift: ρ = x² + s² − 1 for the doubles x and s = fl(√(1 − x²)), computed without rounding
 * loss (Dekker's exact product by Veltkamp splitting and Knuth's two-sum; Dekker, Numer. Math. 18, 224,
 * 1971). W(x) = x I + i s X equals √(1 + ρ) times a unitary, so a product with d factors W carries the
 * spurious factor (1 + ρ)^{d/2}, a relative error up to d·2⁻⁵³ that grows linearly with the degree;
 * dividing by it leaves the product of the exactly unitary W.
 */

/** The exact square of a double as hi + lo. */
function exactSquare(a: number): [number, number] {
  const split = 134217729 * a; // 2^27 + 1
  const hi = split - (split - a);
  const lo = a - hi;
  const square = a * a;
  return [square, hi * hi - square + 2 * hi * lo + lo * lo];
}

export function signalNormDrift(x: number, s: number): number {
  const [xx, xxError] = exactSquare(x);
  const [ss, ssError] = exactSquare(s);
  const sum = xx + ss;
  const sumError = xx - (sum - (sum - xx)) + (ss - (sum - xx));
  // sum lies within a few ulps of 1, so sum − 1 is exact (Sterbenz).
  return sum - 1 + (sumError + xxError + ssError);
}

/** 1 / (1 + ρ)^{count/2}: the factor that removes the drift of `count` factors W(x). */
export function signalNormCorrection(x: number, s: number, count: number): number {
  return Math.exp((-count / 2) * Math.log1p(signalNormDrift(x, s)));
}
