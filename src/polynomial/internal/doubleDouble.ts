/**
 * doubleDouble: the few unevaluated-sum (hi + lo) operations the 1/x series needs to carry about 32 significant digits:
 * Knuth's two-sum, Dekker's exact product by Veltkamp splitting, and a double-double times or divided by a double
 * (Dekker, Numer. Math. 18, 224, 1971; Hida, Li & Bailey's double-double algorithms, 2001; from memory). Each result's
 * relative error is a small multiple of 2⁻¹⁰⁴.
 */

/** A value hi + lo with |lo| ≤ ulp(hi)/2. */
export interface DoubleDouble {
  readonly hi: number;
  readonly lo: number;
}

const SPLITTER = 134217729; // 2^27 + 1

/** s + e = a + b exactly. */
function twoSum(a: number, b: number): DoubleDouble {
  const s = a + b;
  const v = s - a;
  return { hi: s, lo: a - (s - v) + (b - v) };
}

/** p + e = a·b exactly (no overflow for |a|, |b| < 2^996). */
function twoProduct(a: number, b: number): DoubleDouble {
  const p = a * b;
  const as = SPLITTER * a;
  const ah = as - (as - a);
  const al = a - ah;
  const bs = SPLITTER * b;
  const bh = bs - (bs - b);
  const bl = b - bh;
  return { hi: p, lo: ah * bh - p + ah * bl + al * bh + al * bl };
}

function normalise(hi: number, lo: number): DoubleDouble {
  const s = hi + lo;
  return { hi: s, lo: lo - (s - hi) };
}

export function ddAdd(a: DoubleDouble, b: DoubleDouble): DoubleDouble {
  const s = twoSum(a.hi, b.hi);
  return normalise(s.hi, s.lo + a.lo + b.lo);
}

export function ddTimes(a: DoubleDouble, b: number): DoubleDouble {
  const p = twoProduct(a.hi, b);
  return normalise(p.hi, p.lo + a.lo * b);
}

export function ddDivide(a: DoubleDouble, b: number): DoubleDouble {
  const q = a.hi / b;
  const p = twoProduct(q, b);
  const remainder = a.hi - p.hi - p.lo + a.lo;
  return normalise(q, remainder / b);
}
