// structuredCounts: hierarchical counts (with cost overrides) equal the counts of the flattened circuit, and known
// constructions have their published gate counts.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { flatten } from '../../src/circuit/flatten.js';
import { defineBlock } from '../../src/circuit/defineBlock.js';
import { call, gate } from '../../src/circuit/ops.js';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import type { Block, Circuit } from '../../src/circuit/types.js';
import { quantumFourierTransform } from '../../src/arithmetic/quantumFourierTransform.js';
import { cuccaroAdder } from '../../src/arithmetic/cuccaroAdder.js';
import { fourierConstantAdder } from '../../src/arithmetic/fourierConstantAdder.js';
import { ripplePairAddition } from '../../src/arithmetic/rippleConstantAddition.js';
import { orbitalRotation } from '../../src/rotations/orbitalRotation.js';
import { phasedGivensRotation } from '../../src/rotations/phasedGivensRotation.js';
import { randomUnitary } from '../rotations/helpers/randomMatrices.js';
import { collectOverrides, defaultOverrideRules } from '../../src/cost/collectOverrides.js';
import type { CostOverride, OverrideTable } from '../../src/cost/CostOverride.js';
import { singleCharge, singleKind, sumCounts, type HierarchyCount } from '../../src/cost/HierarchyCount.js';
import { structuredBlockCounts, structuredCircuitCounts } from '../../src/cost/structuredCounts.js';
import { structuredGateKind } from '../../src/cost/structuredGateKind.js';
import { lowerKinds } from '../../src/cost/decompositionTable.js';
import { resourceTotals } from '../../src/cost/resourceTotals.js';
import { tally } from '../../src/cost/Tally.js';
import { constantAngleCircuit } from './helpers/constantAngleCircuit.js';

/** The reference: stream the flat gates, keeping overridden blocks whole and charging their override per kept call. */
function flatCounts(circuit: Circuit, overrides: OverrideTable): HierarchyCount {
  const parts: (readonly [HierarchyCount, number])[] = [];
  for (const op of flatten(circuit, { keepWhole: (block) => overrides.has(block) })) {
    if (op.kind === 'gate') {
      parts.push([singleKind(structuredGateKind(op.name, op.params, op.controls.length, op.negControls.length, op.inverse, op.power)), 1]);
    } else if (op.kind === 'native') {
      const override = overrides.get(op.block)!;
      const count = override.cost({
        controls: op.controls.length,
        negControls: op.negControls.length,
        inverse: op.inverse,
        times: op.power,
        countOps: (ops, c, n, inv) => structuredBlockCounts(defineBlock({ name: 'part', role: 'override part', qubits: op.block.qubits }, ops), overrides, { controls: c, negControls: n, inverse: inv }),
      });
      parts.push([count, 1]);
    }
  }
  return sumCounts(parts);
}

function asObject(count: HierarchyCount): { kinds: Record<string, number>; charges: Record<string, [number, number]> } {
  return {
    kinds: Object.fromEntries([...count.kinds].filter(([, v]) => v.count !== 0).map(([k, v]) => [k, v.count]).sort()),
    charges: Object.fromEntries([...count.charges].map(([k, v]) => [k, [v.applications, v.tally.toffoli]])),
  };
}

/** A fixed-charge override on every block whose name ends in an odd digit (so some nested blocks are overridden). */
function oddBlockOverrides(circuit: Circuit): OverrideTable {
  const fixed: CostOverride = { label: 'fixed', source: 'test', cost: (c) => sumCounts([[singleCharge('fixed', 'test', tally({ toffoli: 1 + c.controls })), c.times]]) };
  const rule = (block: Block): CostOverride | null => (/[13579]$/.test(block.name) ? fixed : null);
  const roots = circuit.ops.flatMap((op) => (op.kind === 'call' ? [op.block] : []));
  return collectOverrides(roots, [...defaultOverrideRules(), rule]);
}

describe('structuredCircuitCounts', () => {
  it('equals the counts of the flattened circuit, with and without overrides (property)', () => {
    fc.assert(
      fc.property(constantAngleCircuit(), (circuit) => {
        const none: OverrideTable = new WeakMap();
        expect(asObject(structuredCircuitCounts(circuit, none))).toEqual(asObject(flatCounts(circuit, none)));
        const overrides = oddBlockOverrides(circuit);
        expect(asObject(structuredCircuitCounts(circuit, overrides))).toEqual(asObject(flatCounts(circuit, overrides)));
      }),
      { numRuns: 150 },
    );
  });

  it('scales an override by call count, repeats and nesting', () => {
    const select = defineBlock({ name: 'leaf', role: 'leaf', qubits: 1 }, [gate('x', [0])]);
    const override: CostOverride = { label: 'leaf', source: 'test', cost: (c) => sumCounts([[singleCharge('leaf', 'test', tally({ toffoli: 3 })), c.times]]) };
    const table: OverrideTable = new WeakMap([[select, override]]);
    const middle = defineBlock({ name: 'middle', role: 'middle', qubits: 1 }, [call(select, [0], [], { power: 5 }), call(select, [0])]);
    const top = new CircuitBuilder();
    top.qubits('q', 2);
    top.add(call(middle, [0], [], { power: 10_000 }), call(middle, [1], [], { controls: [0] }));
    const count = structuredCircuitCounts(top.build(), table);
    expect(count.charges.get('leaf')).toMatchObject({ applications: 6 * 10_001, tally: { toffoli: 18 * 10_001 } });
  });
});

describe('known constructions', () => {
  it('QFT on n qubits has n(n−1)/2 controlled phases and n Hadamards', () => {
    // Nielsen & Chuang, Quantum Computation and Quantum Information, §5.1 (Fig. 5.1).
    for (const n of [1, 2, 5, 9]) {
      const count = structuredBlockCounts(quantumFourierTransform(n, { swaps: false }));
      const byName = (name: string): number => [...count.kinds.values()].filter((k) => k.kind.name === name).reduce((s, k) => s + k.count, 0);
      expect(byName('cp')).toBe((n * (n - 1)) / 2);
      expect(byName('h')).toBe(n);
    }
  });

  it('the ripple-carry adder has 2n − 1 Toffolis with a carry out and 2n − 2 modulo 2^n', () => {
    // Cuccaro, Draper, Kutin & Moulton, arXiv:quant-ph/0410184 (2004): 2n − 1 Toffolis for the n-bit adder with carry
    // out (from memory); without the carry-out Toffoli one fewer.
    for (const n of [1, 2, 4, 7]) {
      const withCarry = lowerKinds(structuredBlockCounts(cuccaroAdder(n, { carryOut: true })).kinds.values());
      const modular = lowerKinds(structuredBlockCounts(cuccaroAdder(n)).kinds.values());
      expect(withCarry.toffoli).toBe(2 * n - 1);
      expect(modular.toffoli).toBe(2 * n - 2);
    }
  });

  it('a Givens network on n modes has n(n−1)/2 two-mode rotations', () => {
    // Clements et al., Optica 3, 1460 (2016): a universal interferometer on n modes has n(n−1)/2 beam splitters.
    for (const n of [2, 3, 6, 9]) {
      const block = orbitalRotation(randomUnitary(n, 7 + n));
      const counter: CostOverride = { label: 'givens', source: 'test', cost: () => singleCharge('givens', 'test', tally({})) };
      const count = structuredBlockCounts(block, new WeakMap([[phasedGivensRotation, counter]]));
      expect(count.charges.get('givens')?.applications).toBe((n * (n - 1)) / 2);
    }
  });

  it('SELECT of L items costs L − 1 Toffolis by unary iteration', () => {
    // Babbush et al., Phys. Rev. X 8, 041015 (2018), §III A: controlled unary iteration over L items, 4L − 4 T (from memory).
    const items = 12;
    const action = Array.from({ length: items }, (_, k) => {
      const index = [1, 2, 3, 4];
      return gate('z', [0], [], { controls: index.filter((_, b) => (k >> b) & 1), negControls: index.filter((_, b) => !((k >> b) & 1)) });
    });
    const block = { ...defineBlock({ name: 'lcu_like', role: 'lcu', qubits: 5 }, []), body: { kind: 'conjugated' as const, compute: [gate('h', [1])], action } };
    const table = collectOverrides([block], defaultOverrideRules());
    const count = structuredBlockCounts(block, table, { controls: 1 });
    expect(count.charges.get('SELECT by unary iteration')?.tally.toffoli).toBe(items - 1);
  });

  it('a pair term holds its AND for 1 Toffoli with measured uncompute (2 otherwise), around its t-controlled additions', () => {
    // Gidney, Quantum 2, 74 (2018): a temporary logical-AND costs 4 T (one Toffoli's worth) to compute and 0 T to erase.
    const width = 4;
    const pairs = [[0, 1], [1, 2], [0, 2]] as const;
    const adder = fourierConstantAdder(width, 1, { pairOnlyControls: 2, pairs });
    const measured = structuredBlockCounts(adder, collectOverrides([adder], defaultOverrideRules()));
    const clean = structuredBlockCounts(adder, collectOverrides([adder], defaultOverrideRules({ multiControl: 'clean' })));
    const byDisplay = (count: HierarchyCount, display: string): number =>
      [...count.kinds.values()].filter((k) => k.kind.display === display).reduce((sum, k) => sum + k.count, 0);
    const charge = measured.charges.get('temporary logical-AND (measured uncompute)');
    expect(charge).toMatchObject({ applications: pairs.length, tally: { toffoli: pairs.length } });
    expect(byDisplay(measured, 'ccx')).toBe(0);
    expect(clean.charges.size).toBe(0);
    expect(byDisplay(clean, 'ccx')).toBe(2 * pairs.length);
    // The phases are counted either way: width under t per pair, width under c_0 for the weight (the offset's uncontrolled).
    expect(byDisplay(measured, 'ctrl @ p')).toBe(width * (pairs.length + 1));
    expect(byDisplay(clean, 'ctrl @ p')).toBe(width * (pairs.length + 1));
    // Same for the ripple route: one AND per pair, the ripple addition (loads from t, Cuccaro adder) counted as simulated.
    const ripple = defineBlock({ name: 'ripple_pairs', role: 'test', qubits: 2 * width + 5 }, pairs.flatMap(([a, b]) =>
      ripplePairAddition(5, { register: [0, 1, 2, 3], scratch: [4, 5, 6, 7], carry: 8, pair: [9 + a, 9 + b], and: 12 })));
    const rippleMeasured = resourceTotals(structuredBlockCounts(ripple, collectOverrides([ripple], defaultOverrideRules())));
    const rippleClean = resourceTotals(structuredBlockCounts(ripple, collectOverrides([ripple], defaultOverrideRules({ multiControl: 'clean' }))), { multiControl: 'clean' });
    // Cuccaro modulo 2^w: 2w − 2 Toffolis per addition (Cuccaro et al., arXiv:quant-ph/0410184, from memory), + 1 or 2 per AND.
    expect(rippleMeasured.toffoli).toBe(pairs.length * (2 * width - 2 + 1));
    expect(rippleClean.toffoli).toBe(pairs.length * (2 * width - 2 + 2));
  });
});

describe('structuredBlockCounts of a block called both ways', () => {
  it('counts the adjoint of a gate list, derived from the list counted the other way, as counting it afresh does (same kinds in the same order)', () => {
    const gatesArb = fc.array(
      fc.record({
        name: fc.constantFrom('ry', 'rz', 's', 't', 'x', 'h', 'cx', 'p'),
        angle: fc.oneof(fc.constant(Math.PI / 4), fc.double({ min: -3, max: 3, noNaN: true })),
        control: fc.boolean(),
        power: fc.constantFrom(1, 2, -1),
      }),
      { minLength: 1, maxLength: 12 },
    );
    fc.assert(
      fc.property(gatesArb, fc.integer({ min: 0, max: 2 }), (gates, extra) => {
        const ops = gates.map(({ name, angle, control, power }) => {
          const params = ['ry', 'rz', 'p'].includes(name) ? [angle] : [];
          const qubits = name === 'cx' ? [1, 2] : [1];
          return gate(name, qubits, params, { ...(control ? { controls: [0] } : {}), power });
        });
        const list = defineBlock({ name: 'list', role: 'gates', qubits: 3 }, ops);
        const both = defineBlock({ name: 'both', role: 'list, then its adjoint', qubits: 3 }, [call(list, [0, 1, 2]), call(list, [0, 1, 2], [], { inverse: true })]);
        const shared = structuredBlockCounts(both, new WeakMap(), { controls: extra });
        const separate = sumCounts([
          [structuredBlockCounts(list, new WeakMap(), { controls: extra }), 1],
          [structuredBlockCounts(list, new WeakMap(), { controls: extra, inverse: true }), 1],
        ]);
        const entries = (count: HierarchyCount) => [...count.kinds].map(([key, entry]) => [key, entry.kind, entry.count]);
        expect(entries(shared)).toEqual(entries(separate));
      }),
      { numRuns: 150 },
    );
  });
});
