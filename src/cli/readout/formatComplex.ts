/** formatComplex: "re + im·i" with a fixed number of significant digits, for terminal tables. */
import type { ComplexScalar } from '../../linalg/ComplexScalar.js';

export function formatComplex(value: ComplexScalar, digits = 10): string {
  const sign = value.im < 0 || Object.is(value.im, -0) ? '-' : '+';
  return `${value.re.toPrecision(digits)} ${sign} ${Math.abs(value.im).toPrecision(digits)}i`;
}
