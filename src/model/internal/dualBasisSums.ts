/**
 * dualBasisSums: the reciprocal-space sums of the plane-wave dual basis Hamiltonian (Babbush et al., Phys. Rev. X 8,
 * 011044, 2018, the dual-basis Hamiltonian with its kinetic, external-potential and Coulomb sums, Eq. (8) there;
 * equation number from memory), in atomic units, cosine form, over the reciprocal grid of planeWaveGrid.
 *
 * Translation invariance does the heavy lifting: the kinetic and Coulomb entries depend on r_p − r_q only, so each is one
 * table over the P displacements (P sums of P terms, O(P²) in all) rather than P² sums.
 */
import type { PlaneWaveGrid } from './planeWaveGrid.js';

/**
 * table[Δ] = Σ_ν weight[ν] cos(k_ν · r_Δ) for every grid displacement Δ (flattened like the grid points), where
 * k_ν · r_Δ = 2π Σ_d ν_d Δ_d / n_d is reduced exactly with integers first. table[−Δ] is set to the very value of
 * table[Δ], so the matrices built from it are exactly symmetric and exactly translation-invariant.
 */
export function displacementSeries(grid: PlaneWaveGrid, weight: Float64Array): Float64Array {
  const { size, points, index } = grid;
  const table = new Float64Array(size);
  const done = new Uint8Array(size);
  for (let delta = 0; delta < size; delta++) {
    if (done[delta] === 1) continue;
    let sum = 0;
    for (let m = 0; m < size; m++) {
      const w = weight[m]!;
      if (w === 0) continue;
      let turns = 0;
      for (let d = 0; d < points.length; d++) {
        const n = points[d]!;
        // m_d ≡ ν_d (mod n_d), and on grid displacements only the residue matters.
        turns += ((index[d]![m]! * index[d]![delta]!) % n) / n;
      }
      sum += w * Math.cos(2 * Math.PI * turns);
    }
    const negative = negated(grid, delta);
    table[delta] = sum;
    table[negative] = sum;
    done[delta] = 1;
    done[negative] = 1;
  }
  return table;
}

/** T(Δ) = (1/P) Σ_ν (k_ν²/2) cos(k_ν · r_Δ): the kinetic entry T_pq of either spin at r_p − r_q = r_Δ. */
export function kineticSeries(grid: PlaneWaveGrid): Float64Array {
  return displacementSeries(grid, grid.kSquared.map((k2) => k2 / (2 * grid.size)));
}

/**
 * v(Δ) = (4π/Ω) Σ_{ν≠0} cos(k_ν · r_Δ)/k_ν²: the periodic Coulomb kernel sampled on the grid (the k = 0 term dropped,
 * i.e. a neutralising background). Electrons interact by ½ Σ_{(p,σ)≠(q,τ)} v(r_p − r_q) n_pσ n_qτ, which is the
 * paper's (2π/Ω) Σ_{(p,σ)≠(q,τ)} Σ_{ν≠0} cos(k_ν · r_{p−q})/k_ν² n_pσ n_qτ.
 */
export function coulombSeries(grid: PlaneWaveGrid): Float64Array {
  return displacementSeries(grid, coulombWeights(grid));
}

/** (4π/Ω)/k_ν² for ν ≠ 0, 0 for ν = 0. */
function coulombWeights(grid: PlaneWaveGrid): Float64Array {
  const scale = (4 * Math.PI) / grid.volume;
  return grid.kSquared.map((k2) => (k2 === 0 ? 0 : scale / k2));
}

export interface PointCharge {
  /** R_j (bohr), any finite coordinates: the potential is periodic, so a position counts by its image in the box. */
  readonly position: readonly number[];
  readonly charge: number;
}

/**
 * U_p = −(4π/Ω) Σ_{ν≠0} Σ_j Z_j cos(k_ν · (R_j − r_p))/k_ν²: the potential energy of an electron at r_p in the field of
 * the point charges (attractive for Z > 0). Computed as −Σ_ν (4π/Ω)/k_ν² Re(c_ν e^{−i k_ν·r_p}) with
 * c_ν = Σ_j Z_j e^{i k_ν·R_j}: O(charges × P + P²). Off-grid positions make the signed ν matter: the symmetric set
 * with the Nyquist term +n_d/2 (planeWaveGrid).
 */
export function externalPotential(grid: PlaneWaveGrid, charges: readonly PointCharge[]): Float64Array {
  const { size, points, box, index, frequency } = grid;
  const weights = coulombWeights(grid);
  const cRe = new Float64Array(size);
  const cIm = new Float64Array(size);
  for (const { position, charge } of charges) {
    const wrapped = position.map((x, d) => x - box[d]! * Math.floor(x / box[d]!));
    for (let m = 0; m < size; m++) {
      let phase = 0;
      for (let d = 0; d < points.length; d++) phase += (2 * Math.PI * frequency[d]![m]! * wrapped[d]!) / box[d]!;
      cRe[m]! += charge * Math.cos(phase);
      cIm[m]! += charge * Math.sin(phase);
    }
  }
  const potential = new Float64Array(size);
  for (let p = 0; p < size; p++) {
    let sum = 0;
    for (let m = 0; m < size; m++) {
      if (weights[m] === 0) continue;
      let turns = 0;
      for (let d = 0; d < points.length; d++) turns += ((index[d]![m]! * index[d]![p]!) % points[d]!) / points[d]!;
      const angle = 2 * Math.PI * turns;
      sum += weights[m]! * (cRe[m]! * Math.cos(angle) + cIm[m]! * Math.sin(angle));
    }
    potential[p] = -sum;
  }
  return potential;
}

/** The flattened displacement −Δ. */
function negated(grid: PlaneWaveGrid, delta: number): number {
  let flat = 0;
  let stride = 1;
  grid.points.forEach((n, d) => {
    flat += stride * ((n - grid.index[d]![delta]!) % n);
    stride *= n;
  });
  return flat;
}
