/**
 * solveDenseSystem: x with A x = b for a dense real n×n matrix (row-major), by Gaussian elimination
 * with partial pivoting (Golub & Van Loan, Matrix Computations, 4th ed., Alg. 3.4.1). A and b are
 * overwritten; the solution is returned in b.
 */
export function solveDenseSystem(a: Float64Array, b: Float64Array, n: number): Float64Array {
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    let pivotSize = Math.abs(a[col * n + col]!);
    for (let r = col + 1; r < n; r++) {
      const size = Math.abs(a[r * n + col]!);
      if (size > pivotSize) {
        pivotSize = size;
        pivotRow = r;
      }
    }
    if (pivotSize === 0) throw new RangeError(`solveDenseSystem: matrix is singular at column ${col}`);
    if (pivotRow !== col) {
      for (let c = col; c < n; c++) {
        const t = a[col * n + c]!;
        a[col * n + c] = a[pivotRow * n + c]!;
        a[pivotRow * n + c] = t;
      }
      const t = b[col]!;
      b[col] = b[pivotRow]!;
      b[pivotRow] = t;
    }
    const pivot = a[col * n + col]!;
    for (let r = col + 1; r < n; r++) {
      const factor = a[r * n + col]! / pivot;
      if (factor === 0) continue;
      const rowBase = r * n;
      const pivotBase = col * n;
      for (let c = col + 1; c < n; c++) a[rowBase + c] = a[rowBase + c]! - factor * a[pivotBase + c]!;
      b[r] = b[r]! - factor * b[col]!;
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let sum = b[r]!;
    for (let c = r + 1; c < n; c++) sum -= a[r * n + c]! * b[c]!;
    b[r] = sum / a[r * n + r]!;
  }
  return b;
}
