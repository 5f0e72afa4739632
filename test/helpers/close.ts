// The shared float-tolerance checks of the test suite: absolute-or-relative closeness of reals, complex numbers and matrices.
import { expect } from 'vitest';

/** |actual − expected| ≤ tol · max(1, |expected|). */
export function expectClose(actual: number, expected: number, tol: number, label = 'value'): void {
  const bound = tol * Math.max(1, Math.abs(expected));
  if (!(Math.abs(actual - expected) <= bound)) {
    expect.fail(`${label}: ${actual} differs from ${expected} by more than ${bound}`);
  }
}

/** |actual − expected| ≤ tol · max(1, |expected|) for complex numbers given as [re, im]. */
export function expectComplexClose(
  actual: readonly [number, number],
  expected: readonly [number, number],
  tol: number,
  label = 'value',
): void {
  const bound = tol * Math.max(1, Math.hypot(expected[0], expected[1]));
  const gap = Math.hypot(actual[0] - expected[0], actual[1] - expected[1]);
  if (!(gap <= bound)) {
    expect.fail(`${label}: ${actual[0]}${actual[1] < 0 ? '' : '+'}${actual[1]}i differs from ` +
      `${expected[0]}${expected[1] < 0 ? '' : '+'}${expected[1]}i by ${gap} > ${bound}`);
  }
}

/** Entry-wise complex closeness of two equally sized row-major complex arrays (re/im pairs of arrays). */
export function expectComplexArrayClose(
  actual: { readonly re: ArrayLike<number>; readonly im: ArrayLike<number> },
  expected: { readonly re: ArrayLike<number>; readonly im: ArrayLike<number> },
  tol: number,
  label = 'array',
): void {
  if (actual.re.length !== expected.re.length) {
    expect.fail(`${label}: length ${actual.re.length} differs from ${expected.re.length}`);
  }
  for (let e = 0; e < actual.re.length; e++) {
    expectComplexClose([actual.re[e]!, actual.im[e]!], [expected.re[e]!, expected.im[e]!], tol, `${label}[${e}]`);
  }
}
