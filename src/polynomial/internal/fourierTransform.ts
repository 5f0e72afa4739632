/**
 * fourierTransform: in-place iterative radix-2 complex FFT on separate real / imaginary Float64Arrays
 * (Cooley & Tukey, Math. Comp. 19, 297, 1965), X_k = Σ_n x_n e^{∓2πi kn/N} (sign −1 forward, +1 inverse,
 * unnormalised). The length must be a power of two.
 */
export function fourierTransform(re: Float64Array, im: Float64Array, sign: 1 | -1): void {
  const n = re.length;
  if ((n & (n - 1)) !== 0 || im.length !== n) throw new RangeError(`fourierTransform: length ${n} is not a power of two matching both arrays`);
  for (let i = 1, j = 0; i < n; i++) {
    let bit = n >> 1;
    for (; j & bit; bit >>= 1) j ^= bit;
    j ^= bit;
    if (i < j) {
      const tr = re[i]!;
      re[i] = re[j]!;
      re[j] = tr;
      const ti = im[i]!;
      im[i] = im[j]!;
      im[j] = ti;
    }
  }
  for (let length = 2; length <= n; length <<= 1) {
    const half = length >> 1;
    const angle = (sign * 2 * Math.PI) / length;
    const stepRe = Math.cos(angle);
    const stepIm = Math.sin(angle);
    for (let start = 0; start < n; start += length) {
      let wRe = 1;
      let wIm = 0;
      for (let k = 0; k < half; k++) {
        const a = start + k;
        const b = a + half;
        const xr = re[b]! * wRe - im[b]! * wIm;
        const xi = re[b]! * wIm + im[b]! * wRe;
        re[b] = re[a]! - xr;
        im[b] = im[a]! - xi;
        re[a] = re[a]! + xr;
        im[a] = im[a]! + xi;
        if ((k & 63) === 63) {
          // Recompute the twiddle exactly every 64 steps so the recurrence's rounding cannot grow.
          wRe = Math.cos(angle * (k + 1));
          wIm = Math.sin(angle * (k + 1));
        } else {
          const t = wRe * stepRe - wIm * stepIm;
          wIm = wRe * stepIm + wIm * stepRe;
          wRe = t;
        }
      }
    }
  }
}
