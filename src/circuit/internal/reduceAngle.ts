/**
 * reduceAngle: k·a reduced modulo a period (2π or 4π) for an integer k and a double a, computed
 * exactly from the binary values of k and a (BigInt arithmetic against π to 1,300 bits), so that
 * integer powers of rotation gates do not lose the k·ε of a floating-point product.
 */

/** Fractional bits of the fixed-point arithmetic: covers |k·a| up to 2^1077 with 200 bits to spare. */
const FRACTION_BITS = 1280n;
const GUARD_BITS = 64n;

let piFixed: bigint | undefined;

/** arctan(1/x)·2^(FRACTION_BITS+GUARD_BITS) by its Taylor series, truncated (error below 1 unit per term). */
function arctanInverse(x: bigint, one: bigint): bigint {
  const x2 = x * x;
  let power = one / x;
  let sum = power;
  for (let n = 1n; power !== 0n; n++) {
    power /= x2;
    const term = power / (2n * n + 1n);
    sum += n % 2n === 1n ? -term : term;
  }
  return sum;
}

/** π·2^FRACTION_BITS, from Machin's formula π = 16 arctan(1/5) − 4 arctan(1/239) (common practice). */
function pi(): bigint {
  if (piFixed === undefined) {
    const one = 1n << (FRACTION_BITS + GUARD_BITS);
    piFixed = (16n * arctanInverse(5n, one) - 4n * arctanInverse(239n, one)) >> GUARD_BITS;
  }
  return piFixed;
}

/** The double `a` as an exact mantissa·2^exponent. */
function decompose(a: number): { mantissa: bigint; exponent: number } {
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, a);
  const high = view.getUint32(0);
  const low = view.getUint32(4);
  const biased = (high >>> 20) & 0x7ff;
  let mantissa = (BigInt(high & 0xfffff) << 32n) | BigInt(low);
  if (biased !== 0) mantissa |= 1n << 52n;
  const exponent = (biased === 0 ? 1 : biased) - 1075;
  return { mantissa: high >>> 31 === 1 ? -mantissa : mantissa, exponent };
}

/** reduced·2^−FRACTION_BITS as a double, rounding only in the final conversion of its top 64 bits. */
function toDouble(reduced: bigint): number {
  const size = (reduced < 0n ? -reduced : reduced).toString(2).length;
  const drop = Math.max(0, size - 64);
  const scale = drop - Number(FRACTION_BITS);
  return scale < -1022 ? Number(reduced >> BigInt(drop)) * 2 ** (scale + 64) * 2 ** -64 : Number(reduced >> BigInt(drop)) * 2 ** scale;
}

/**
 * (k·a) mod (periodInPi·π), as a double in [−periodInPi·π/2, periodInPi·π/2). `k` must be an integer of
 * magnitude at most 2^53 (every such double is exact, so BigInt(k) is too) and `a` finite; the result is within a
 * few ulps of the exactly reduced value.
 */
export function reduceAngle(k: number, a: number, periodInPi: 2 | 4): number {
  if (!Number.isInteger(k) || Math.abs(k) > 2 ** 53 || !Number.isFinite(a)) {
    throw new RangeError(`reduceAngle: needs an integer of magnitude at most 2^53 and a finite angle, got ${k} and ${a}`);
  }
  if (k === 0 || a === 0) return 0;
  const { mantissa, exponent } = decompose(a);
  const shift = BigInt(exponent) + FRACTION_BITS;
  const product = BigInt(k) * mantissa;
  const value = shift >= 0n ? product << shift : product >> -shift;
  const period = BigInt(periodInPi) * pi();
  const half = period / 2n;
  let reduced = value % period;
  if (reduced >= half) reduced -= period;
  if (reduced < -half) reduced += period;
  return toDouble(reduced);
}
