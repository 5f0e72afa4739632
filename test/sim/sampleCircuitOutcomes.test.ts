// sampleCircuitOutcomes(circuit, shots, seed): seeded counts from the exact distribution, and from
// sampled trajectories when the branches exceed the limit.
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate } from '../../src/circuit/ops.js';
import { sampleCircuitOutcomes } from '../../src/sim/sampleCircuitOutcomes.js';

function total(counts: ReadonlyMap<string, number>): number {
  return [...counts.values()].reduce((s, c) => s + c, 0);
}

describe('sampleCircuitOutcomes(circuit, shots, seed)', () => {
  const bell = new CircuitBuilder();
  bell.qubits('q', 2);
  bell.bits('c', 2);
  bell.add(gate('h', [0]), gate('cx', [0, 1])).measure(0, 0).measure(1, 1);

  it('draws only possible outcomes, sums to the shots, and repeats exactly for the same seed', () => {
    const a = sampleCircuitOutcomes(bell.build(), 2000, 11);
    expect([...a.outcomes.keys()]).toEqual(['00', '11']);
    expect(total(a.outcomes)).toBe(2000);
    expect([...sampleCircuitOutcomes(bell.build(), 2000, 11).outcomes]).toEqual([...a.outcomes]);
    // Binomial(2000, 1/2): 5σ ≈ 112 (common practice).
    expect(Math.abs(a.outcomes.get('00')! - 1000)).toBeLessThan(112);
  });

  it('falls back to seeded trajectories beyond maxBranches, with the same statistics', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 1);
    b.bits('c', 3);
    for (let k = 0; k < 3; k++) b.add(gate('h', [0])).measure(0, k);
    const circuit = b.build();
    const counts = sampleCircuitOutcomes(circuit, 1600, 3, { maxBranches: 4 }).outcomes;
    expect(total(counts)).toBe(1600);
    expect(counts.size).toBe(8);
    // Each of the 8 outcomes has probability 1/8: 5σ = 5·√(1600·(1/8)·(7/8)) ≈ 66.
    for (const c of counts.values()) expect(Math.abs(c - 200)).toBeLessThan(66);
    expect([...sampleCircuitOutcomes(circuit, 1600, 3, { maxBranches: 4 }).outcomes]).toEqual([...counts]);
  });
});
