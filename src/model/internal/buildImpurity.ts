// buildImpurity: the single-impurity Anderson preset
// H = Σσ ε_d n_dσ + U n_d↑ n_d↓ + Σ_kσ ε_k n_kσ + Σ_kσ V_k (d†σ c_kσ + h.c.) − μ N.
import type { BuiltHamiltonian } from './BuiltHamiltonian.js';
import { addToEntry, zeroComplexMatrix } from './complexMatrix.js';
import type { ImpurityInput } from './modelSchemas.js';
import { onSiteInteraction } from './onSiteInteraction.js';

/** Each spin block is [impurity, bath 0, bath 1, …] in file order; the up block first, then the down block. */
export function buildImpurity(input: ImpurityInput): BuiltHamiltonian {
  const { level, interaction, bath } = input.impurity;
  const mu = input.chemicalPotential ?? 0;
  const block = 1 + bath.length;
  const oneBody = zeroComplexMatrix(2 * block);
  for (const offset of [0, block]) {
    addToEntry(oneBody, offset, offset, level - mu, 0);
    bath.forEach((b, k) => {
      const mode = offset + 1 + k;
      addToEntry(oneBody, mode, mode, b.level - mu, 0);
      addToEntry(oneBody, offset, mode, b.coupling, 0);
      addToEntry(oneBody, mode, offset, b.coupling, 0);
    });
  }
  const up = Array.from({ length: block }, (_, m) => m);
  return {
    form: { kind: 'impurity', bathLevels: bath.length },
    modes: 2 * block,
    oneBody,
    twoBody: onSiteInteraction(0, block, interaction),
    spinBlocks: { up, down: up.map((m) => m + block) },
  };
}
