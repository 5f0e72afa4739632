/**
 * ComplexMatrix: a dense complex n×n matrix, row-major (entry (i, j) at index i*n + j), real and
 * imaginary parts in separate Float64Arrays.
 */
export interface ComplexMatrix {
  readonly n: number;
  readonly re: Float64Array;
  readonly im: Float64Array;
}
