/**
 * determinant: the determinant of a small dense complex matrix by Gaussian elimination with partial pivoting.
 */
export function determinant(re: Float64Array, im: Float64Array, k: number): [number, number] {
  const a = re.slice();
  const b = im.slice();
  let dr = 1;
  let di = 0;
  for (let c = 0; c < k; c++) {
    let pivot = c;
    for (let r = c + 1; r < k; r++) {
      if (Math.hypot(a[r * k + c]!, b[r * k + c]!) > Math.hypot(a[pivot * k + c]!, b[pivot * k + c]!)) pivot = r;
    }
    const pr = a[pivot * k + c]!;
    const pi = b[pivot * k + c]!;
    if (pr === 0 && pi === 0) return [0, 0];
    if (pivot !== c) {
      for (let j = 0; j < k; j++) {
        [a[c * k + j], a[pivot * k + j]] = [a[pivot * k + j]!, a[c * k + j]!];
        [b[c * k + j], b[pivot * k + j]] = [b[pivot * k + j]!, b[c * k + j]!];
      }
      dr = -dr;
      di = -di;
    }
    [dr, di] = [dr * pr - di * pi, dr * pi + di * pr];
    const norm = pr * pr + pi * pi;
    for (let r = c + 1; r < k; r++) {
      const xr = a[r * k + c]!;
      const xi = b[r * k + c]!;
      // factor = x / pivot
      const fr = (xr * pr + xi * pi) / norm;
      const fi = (xi * pr - xr * pi) / norm;
      for (let j = c; j < k; j++) {
        const yr = a[c * k + j]!;
        const yi = b[c * k + j]!;
        a[r * k + j] = a[r * k + j]! - (fr * yr - fi * yi);
        b[r * k + j] = b[r * k + j]! - (fr * yi + fi * yr);
      }
    }
  }
  return [dr, di];
}
