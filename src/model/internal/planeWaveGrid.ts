/**
 * planeWaveGrid: the grid points and reciprocal vectors of a periodic box — the index arithmetic of the plane-wave dual
 * basis (Babbush, Wiebe, McClean, McClain, Neven & Chan, Phys. Rev. X 8, 011044, 2018). Atomic units.
 *
 * - Grid points are numbered with the first dimension fastest: p = i_1 + n_1 (i_2 + n_2 i_3), r_p = (i_d L_d / n_d)_d.
 * - Reciprocal vectors k_ν = (2π ν_d / L_d)_d, one per grid point, ν_d over the n_d integers
 *   −⌊(n_d − 1)/2⌋ … ⌊n_d/2⌋: symmetric about 0 for odd n_d; for even n_d the Nyquist frequency +n_d/2 is taken once
 *   (−n_d/2 is the same point of the reciprocal grid). Frequency index m_d ∈ 0 … n_d − 1 stands for ν_d = m_d when
 *   m_d ≤ ⌊n_d/2⌋, else m_d − n_d, flattened like the grid points.
 */

export interface PlaneWaveGrid {
  /** n_d. */
  readonly points: readonly number[];
  /** L_d (bohr). */
  readonly box: readonly number[];
  /** P = Π n_d. */
  readonly size: number;
  /** Ω = Π L_d. */
  readonly volume: number;
  /** index[d][p] = i_d of grid point p (also m_d of frequency index p). */
  readonly index: readonly Int32Array[];
  /** frequency[d][m] = ν_d of flattened frequency index m. */
  readonly frequency: readonly Int32Array[];
  /** |k_ν|² of flattened frequency index m. */
  readonly kSquared: Float64Array;
}

/** ν of frequency index m on an axis of n points (the symmetric set above). */
export function axisFrequency(m: number, n: number): number {
  return m <= Math.floor(n / 2) ? m : m - n;
}

/** @throws RangeError when the lengths differ or a count is not a positive integer (the model parser checks first). */
export function planeWaveGrid(points: readonly number[], box: readonly number[]): PlaneWaveGrid {
  if (points.length !== box.length || points.some((n) => !Number.isInteger(n) || n < 1) || box.some((l) => !(l > 0))) {
    throw new RangeError('planeWaveGrid: points and box need equal lengths, positive integer points and positive lengths');
  }
  const size = points.reduce((a, b) => a * b, 1);
  const index = points.map(() => new Int32Array(size));
  const frequency = points.map(() => new Int32Array(size));
  const kSquared = new Float64Array(size);
  for (let p = 0; p < size; p++) {
    let rest = p;
    points.forEach((n, d) => {
      const i = rest % n;
      rest = (rest - i) / n;
      index[d]![p] = i;
      const nu = axisFrequency(i, n);
      frequency[d]![p] = nu;
      kSquared[p]! += ((2 * Math.PI * nu) / box[d]!) ** 2;
    });
  }
  return { points, box, size, volume: box.reduce((a, b) => a * b, 1), index, frequency, kSquared };
}

/** The flattened grid point at r_p − r_q (periodic), from the flattened points p and q. */
export function displacementIndex(grid: PlaneWaveGrid, p: number, q: number): number {
  let flat = 0;
  let stride = 1;
  grid.points.forEach((n, d) => {
    flat += stride * ((grid.index[d]![p]! - grid.index[d]![q]! + n) % n);
    stride *= n;
  });
  return flat;
}
