// buildHubbard: the Hubbard preset H = −t Σ_<ij>σ (a†iσ a_jσ + h.c.) + U Σ_i n_i↑ n_i↓ − μ Σ_iσ n_iσ.
import type { TwoBodyTerm } from '../FermionModel.js';
import type { BuiltHamiltonian } from './BuiltHamiltonian.js';
import { addToEntry, zeroComplexMatrix } from './complexMatrix.js';
import { latticeBonds } from './latticeBonds.js';
import type { HubbardInput } from './modelSchemas.js';
import { onSiteInteraction } from './onSiteInteraction.js';
import type { Problem } from './Problem.js';
import { MAX_MODES } from '../modelLimits.js';

/** Modes: site s spin up is mode s, spin down is mode L + s (L = number of sites). */
export function buildHubbard(input: HubbardInput, problems: Problem[]): BuiltHamiltonian | undefined {
  const { shape, sites, size, periodic, hopping } = input.lattice;
  let dims: number[];
  if (shape === 'grid') {
    if (sites !== undefined) problems.push({ path: ['lattice', 'sites'], message: 'not used by a grid; give "size": [Lx, Ly]' });
    if (size === undefined) problems.push({ path: ['lattice', 'size'], message: 'required field is missing for a grid' });
    dims = size === undefined ? [] : [...size];
  } else {
    if (size !== undefined) problems.push({ path: ['lattice', 'size'], message: `not used by a ${shape}; give "sites": L` });
    if (periodic !== undefined) problems.push({ path: ['lattice', 'periodic'], message: `only a grid takes "periodic"` });
    if (sites === undefined) problems.push({ path: ['lattice', 'sites'], message: `required field is missing for a ${shape}` });
    dims = sites === undefined ? [] : [sites];
  }
  if (dims.length === 0) return undefined;
  const siteCount = dims.reduce((a, b) => a * b, 1);
  if (2 * siteCount > MAX_MODES) {
    problems.push({ path: ['lattice'], message: `${siteCount} sites make ${2 * siteCount} modes; at most ${MAX_MODES} modes are supported` });
    return undefined;
  }
  const mu = input.chemicalPotential ?? 0;
  const oneBody = zeroComplexMatrix(2 * siteCount);
  const twoBody: TwoBodyTerm[] = [];
  for (const offset of [0, siteCount]) {
    for (let s = 0; s < siteCount; s++) addToEntry(oneBody, offset + s, offset + s, -mu, 0);
    for (const [a, b] of latticeBonds(shape, dims, periodic ?? [false, false])) {
      addToEntry(oneBody, offset + a, offset + b, -hopping, 0);
      addToEntry(oneBody, offset + b, offset + a, -hopping, 0);
    }
  }
  for (let s = 0; s < siteCount; s++) twoBody.push(...onSiteInteraction(s, siteCount + s, input.interaction));
  const up = Array.from({ length: siteCount }, (_, s) => s);
  return {
    form: { kind: 'hubbard', shape, size: dims },
    modes: 2 * siteCount,
    oneBody,
    twoBody,
    spinBlocks: { up, down: up.map((s) => s + siteCount) },
  };
}
