// controlledCount: the memoised count of one singly-controlled application equals structuredBlockCounts with the overrides
// collected from that block, and is computed once per block and rule options.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { collectOverrides, defaultOverrideRules } from '../../src/cost/collectOverrides.js';
import { controlledCount } from '../../src/cost/controlledCount.js';
import type { HierarchyCount } from '../../src/cost/HierarchyCount.js';
import { structuredBlockCounts } from '../../src/cost/structuredCounts.js';
import { pauliLcu } from '../../src/blocks/builders/pauliLcu.js';
import { jordanWigner } from '../../src/operators/jordanWigner.js';
import { modelHamiltonian } from '../../src/operators/modelHamiltonian.js';
import { arbitraryBlockPool } from '../helpers/arbitraryCircuit.js';
import { hubbard } from '../helpers/models.js';

function plain(count: HierarchyCount): unknown {
  return {
    kinds: [...count.kinds].map(([key, entry]) => [key, entry.kind, entry.count]),
    charges: [...count.charges].map(([label, charge]) => [label, charge.applications, charge.tally]),
  };
}

const ruleOptions = fc.record({ unaryIteration: fc.boolean(), gidneyAdder: fc.boolean(), multiControl: fc.constantFrom('measured' as const, 'clean' as const, 'dirty' as const) });

describe('controlledCount(block, options)', () => {
  it('equals the uncached count (same kinds in the same order, same charges) for random blocks and rule options', () => {
    fc.assert(
      fc.property(arbitraryBlockPool(3, 4), ruleOptions, (pool, options) => {
        for (const block of pool) {
          const uncached = structuredBlockCounts(block, collectOverrides([block], defaultOverrideRules(options)), { controls: 1 });
          expect(plain(controlledCount(block, options))).toEqual(plain(uncached));
        }
      }),
      { numRuns: 60 },
    );
  });

  it('returns the same count for the same block and rule options, and counts again for other options', () => {
    const model = hubbard({ sites: 2, hopping: 1, interaction: 4, chemicalPotential: 0 });
    const select = pauliLcu(jordanWigner(modelHamiltonian(model), model.modes), 'H').block;
    const first = controlledCount(select, {});
    expect(controlledCount(select, { unaryIteration: true, multiControl: 'measured' })).toBe(first);
    const simulated = controlledCount(select, { unaryIteration: false });
    expect(simulated).not.toBe(first);
    expect(plain(simulated)).toEqual(plain(structuredBlockCounts(select, collectOverrides([select], defaultOverrideRules({ unaryIteration: false })), { controls: 1 })));
  });
});
