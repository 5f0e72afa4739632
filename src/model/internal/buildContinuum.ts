/**
 * buildContinuum: the grid-discretised continuum preset — electrons in a periodic box on the plane-wave dual basis
 * (Babbush, Wiebe, McClean, McClain, Neven & Chan, Phys. Rev. X 8, 011044, 2018), atomic units:
 * H = Σ_{pqσ} T_pq a†pσ a_qσ + Σ_{pσ} U_p n_pσ + H_int, with T, U from dualBasisSums and H_int one of
 * - "coulomb": ½ Σ_{(p,σ)≠(q,τ)} v(r_p − r_q) n_pσ n_qτ (v the periodic Coulomb kernel 4π/(Ω k²) summed over ν ≠ 0;
 *   in 1D and 2D this is the periodic solution of ∇²v = −4πδ in that dimension, not 1/r);
 * - { contact: g }: (g/ΔV) Σ_p n_p↑ n_p↓ with ΔV = Ω/P, the grid form of g ∫ ρ↑(r) ρ↓(r) dr (g in hartree × bohr^d);
 * - "none".
 * Modes: grid point p spin up is mode p, spin down is mode P + p (points numbered first dimension fastest).
 * The split: A = the kinetic T, B = U (moved through oneBodyInB) + H_int.
 */
import type { TwoBodyTerm } from '../FermionModel.js';
import { MAX_ENERGY, MAX_MODES } from '../modelLimits.js';
import type { BuiltHamiltonian } from './BuiltHamiltonian.js';
import { addToEntry, zeroComplexMatrix } from './complexMatrix.js';
import { coulombSeries, externalPotential, kineticSeries } from './dualBasisSums.js';
import type { ContinuumInput } from './modelSchemas.js';
import { onSiteInteraction } from './onSiteInteraction.js';
import { displacementIndex, planeWaveGrid, type PlaneWaveGrid } from './planeWaveGrid.js';
import type { Problem } from './Problem.js';

/** The Hamiltonian, or undefined after pushing a problem per mistake (lengths against `dimension`, size, energies). */
export function buildContinuum(input: ContinuumInput, problems: Problem[]): BuiltHamiltonian | undefined {
  const { dimension, points, box, interaction } = input.continuum;
  const external = input.continuum.external ?? [];
  const before = problems.length;
  const lengthProblem = (path: (string | number)[], length: number): void => {
    if (length !== dimension) problems.push({ path, message: `expected ${dimension} number${dimension === 1 ? '' : 's'} (dimension ${dimension}), got ${length}` });
  };
  lengthProblem(['continuum', 'points'], points.length);
  lengthProblem(['continuum', 'box'], box.length);
  external.forEach((charge, j) => lengthProblem(['continuum', 'external', j, 'position'], charge.position.length));
  if (problems.length > before) return undefined;

  const size = points.reduce((a, b) => a * b, 1);
  if (2 * size > MAX_MODES) {
    problems.push({ path: ['continuum', 'points'], message: `${size} grid points make ${2 * size} modes; at most ${MAX_MODES} modes are supported` });
    return undefined;
  }
  const kineticTop = points.reduce((sum, n, d) => sum + ((2 * Math.PI * Math.floor(n / 2)) / box[d]!) ** 2 / 2, 0);
  if (kineticTop > MAX_ENERGY) {
    problems.push({ path: ['continuum', 'box'], message: energyMessage('the largest kinetic energy k²/2', kineticTop, 'a larger box or fewer points') });
    return undefined;
  }
  const grid = planeWaveGrid(points, box);
  const potential = externalPotential(grid, external);
  const potentialTop = potential.reduce((a, u) => Math.max(a, Math.abs(u)), 0);
  if (potentialTop > MAX_ENERGY) {
    problems.push({ path: ['continuum', 'external'], message: energyMessage('the external potential |U_p|', potentialTop, 'smaller charges') });
  }
  const twoBody = interactionTerms(grid, interaction, problems);
  if (problems.length > before) return undefined;

  const kinetic = kineticSeries(grid);
  const oneBody = zeroComplexMatrix(2 * size);
  const oneBodyInB = zeroComplexMatrix(2 * size);
  for (const offset of [0, size]) {
    for (let p = 0; p < size; p++) {
      for (let q = 0; q < size; q++) addToEntry(oneBody, offset + p, offset + q, kinetic[displacementIndex(grid, p, q)]!, 0);
      addToEntry(oneBody, offset + p, offset + p, potential[p]!, 0);
      addToEntry(oneBodyInB, offset + p, offset + p, potential[p]!, 0);
    }
  }
  const up = Array.from({ length: size }, (_, p) => p);
  return {
    form: { kind: 'continuum', dimension: dimension as 1 | 2 | 3, points: [...points], box: [...box] },
    modes: 2 * size,
    oneBody,
    oneBodyInB,
    twoBody,
    spinBlocks: { up, down: up.map((p) => p + size) },
  };
}

function interactionTerms(grid: PlaneWaveGrid, interaction: ContinuumInput['continuum']['interaction'], problems: Problem[]): TwoBodyTerm[] {
  const size = grid.size;
  if (interaction === 'none') return [];
  if (interaction === 'coulomb') {
    const v = coulombSeries(grid);
    if (v[0]! > MAX_ENERGY) {
      problems.push({ path: ['continuum', 'interaction'], message: energyMessage('the Coulomb kernel v(0)', v[0]!, 'a different box') });
      return [];
    }
    // ½ Σ_{i≠j} v n_i n_j over all spin-orbitals i, j: V_ijij = v(r_i − r_j), both orders listed (as onSiteInteraction).
    const terms: TwoBodyTerm[] = [];
    for (let i = 0; i < 2 * size; i++) {
      for (let j = 0; j < 2 * size; j++) {
        if (i === j) continue;
        const w = v[displacementIndex(grid, i % size, j % size)]!;
        if (w !== 0) terms.push({ i, j, k: i, l: j, re: w, im: 0 });
      }
    }
    return terms;
  }
  const strength = (interaction.contact * size) / grid.volume;
  if (Math.abs(strength) > MAX_ENERGY) {
    problems.push({ path: ['continuum', 'interaction', 'contact'], message: energyMessage('g/ΔV', Math.abs(strength), 'a smaller g or a coarser grid') });
    return [];
  }
  const terms: TwoBodyTerm[] = [];
  for (let p = 0; p < size; p++) terms.push(...onSiteInteraction(p, size + p, strength));
  return terms;
}

function energyMessage(what: string, value: number, remedy: string): string {
  return `${what} = ${value.toPrecision(4)} hartree exceeds ${MAX_ENERGY}, the largest energy a model may hold; use ${remedy}`;
}
