/**
 * ChebyshevSeries: a real polynomial p(x) = Σ_k coefficients[k] T_k(x) in the Chebyshev basis of the
 * first kind, with its parity (for 'even' / 'odd' the coefficients of the other parity are exactly 0).
 */
export type Parity = 'even' | 'odd' | 'none';

export interface ChebyshevSeries {
  readonly parity: Parity;
  /** Length degree + 1; coefficients[k] multiplies T_k. */
  readonly coefficients: Float64Array;
}
