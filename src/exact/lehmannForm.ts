/**
 * lehmannForm: poles and residues of G by full diagonalisation of the N and N±1 sectors (Lehmann 1954):
 * G_ij(z) = Σ_p R^p_ij / (z − ε_p), particle poles ε = E_m(N+1) − E0 with R_ij = ⟨ψ0|a_i|m⟩⟨m|a_j†|ψ0⟩,
 * hole poles ε = E0 − E_m(N−1) with R_ij = ⟨ψ0|a_j†|m⟩⟨m|a_i|ψ0⟩, averaged over the ground level.
 */
import { InputError } from '../core/InputError.js';
import type { ComplexMatrix } from '../linalg/ComplexMatrix.js';
import type { FermionModel } from '../model/FermionModel.js';
import { applyLadder } from './applyLadder.js';
import { fockSector, type FockSector } from './fockSector.js';
import { denseSector, type DenseSpectrum } from './internal/denseSector.js';
import { groundSectorSpec, shiftedSpec } from './internal/modelSectors.js';
import { dot, zeroVec, type CVec } from './internal/vec.js';
import { sectorDimension } from './sectorDimension.js';
import { sectorHamiltonian } from './sectorHamiltonian.js';

export interface LehmannPole {
  readonly energy: number;
  readonly part: 'particle' | 'hole';
  readonly residue: ComplexMatrix;
}

export interface LehmannForm {
  readonly groundEnergy: number;
  readonly degeneracy: number;
  /** Ascending in energy; coincident eigenvalues (within 1e-9·max(1,|ε|)) merged. */
  readonly poles: readonly LehmannPole[];
}

export interface LehmannOptions {
  /** Largest sector dimension diagonalised densely. Default 2000. */
  readonly maxDimension?: number;
  /** Relative tolerance of the ground-level degeneracy. Default 1e-8. */
  readonly degeneracyTolerance?: number;
}

/** @throws InputError when a sector is larger than `maxDimension` */
export function lehmannForm(model: FermionModel, options: LehmannOptions = {}): LehmannForm {
  const maxDim = options.maxDimension ?? 2000;
  const n = model.modes;
  const spec = groundSectorSpec(model);
  const solve = (s: typeof spec): { sector: FockSector; spectrum: DenseSpectrum } | null => {
    if (s.electrons < 0 || s.electrons > n || sectorDimension(s) === 0) return null;
    const dim = sectorDimension(s);
    if (dim > maxDim) throw new InputError(`lehmannForm: sector dimension ${dim} exceeds maxDimension ${maxDim}`);
    const sector = fockSector(s);
    return { sector, spectrum: denseSector(sectorHamiltonian(model, sector)) };
  };
  const ground = solve(spec)!;
  const e0 = ground.spectrum.values[0]!;
  const degTol = (options.degeneracyTolerance ?? 1e-8) * Math.max(1, Math.abs(e0));
  const groundIdx: number[] = [];
  ground.spectrum.values.forEach((e, k) => {
    if (e - e0 <= degTol) groundIdx.push(k);
  });
  const degeneracy = groundIdx.length * ground.spectrum.weight;
  const allModes = Array.from({ length: n }, (_, m) => m);
  const poles: LehmannPole[] = [];
  for (const particle of [true, false]) {
    const target = solve(shiftedSpec(spec, particle ? 1 : -1, allModes));
    if (target === null) continue;
    const raw: { energy: number; residue: ComplexMatrix }[] = Array.from(target.spectrum.values, (e) => ({
      energy: particle ? e - e0 : e0 - e,
      residue: { n, re: new Float64Array(n * n), im: new Float64Array(n * n) },
    }));
    const w = (ground.spectrum.weight * target.spectrum.weight) / degeneracy;
    for (const g of groundIdx) {
      const psi = ground.spectrum.vectors[g]!;
      // amp[i][m] = ⟨m|a_i†|ψ⟩ (particle) or ⟨m|a_i|ψ⟩ (hole)
      const amp = allModes.map((i) => {
        const phi: CVec = zeroVec(target.sector.dimension, true);
        applyLadder(ground.sector, target.sector, i, particle, psi, 1, 0, phi);
        return target.spectrum.vectors.map((m) => dot(m, phi));
      });
      raw.forEach((pole, m) => {
        for (let i = 0; i < n; i++) {
          for (let j = 0; j < n; j++) {
            // particle: conj(amp_i) amp_j; hole: amp_i conj(amp_j)
            const [ar, ai] = amp[particle ? i : j]![m]!;
            const [br, bi] = amp[particle ? j : i]![m]!;
            pole.residue.re[i * n + j]! += w * (ar * br + ai * bi);
            pole.residue.im[i * n + j]! += w * (ar * bi - ai * br);
          }
        }
      });
    }
    raw.sort((a, b) => a.energy - b.energy);
    for (const pole of raw) {
      const last = poles[poles.length - 1];
      if (last !== undefined && last.part === (particle ? 'particle' : 'hole') && Math.abs(last.energy - pole.energy) <= 1e-9 * Math.max(1, Math.abs(pole.energy))) {
        for (let k = 0; k < n * n; k++) {
          last.residue.re[k]! += pole.residue.re[k]!;
          last.residue.im[k]! += pole.residue.im[k]!;
        }
      } else {
        poles.push({ energy: pole.energy, part: particle ? 'particle' : 'hole', residue: pole.residue });
      }
    }
  }
  poles.sort((a, b) => a.energy - b.energy);
  return { groundEnergy: e0, degeneracy, poles };
}
