/**
 * shotsForPrecision: how many runs of each Hadamard test bring the standard error of Re G and of Im G below ε. Each
 * test estimates x = 2P − 1 with variance (1 − x²)/N ≤ 1/N, and G's component is Σ_t s_t x_t over its tests, so
 * N = ⌈Σ_t s_t² / ε²⌉ suffices whatever the x_t are — the α²/ε² law of the Hadamard test (s_t = sign·α/d).
 */
export interface ShotPlan {
  readonly precision: number;
  /** Runs of every Hadamard test. */
  readonly shotsPerTest: number;
  readonly tests: number;
  /** shotsPerTest × tests. */
  readonly totalShots: number;
}

/** `scales` lists (component, s) for every test; ε > 0. */
export function shotsForPrecision(scales: readonly { readonly component: 're' | 'im'; readonly scale: number }[], precision: number): ShotPlan {
  if (!(precision > 0)) throw new RangeError(`shotsForPrecision: precision ${precision} is not positive`);
  const sumSquares = (component: 're' | 'im'): number => scales.filter((t) => t.component === component).reduce((sum, t) => sum + t.scale ** 2, 0);
  const shotsPerTest = Math.max(1, Math.ceil(Math.max(sumSquares('re'), sumSquares('im')) / precision ** 2));
  return { precision, shotsPerTest, tests: scales.length, totalShots: shotsPerTest * scales.length };
}
