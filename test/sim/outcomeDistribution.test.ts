// outcomeDistribution(circuit): exact outcome probabilities with terminal and mid-circuit
// measurements and resets, against hand-computed values; bit order and branch limits.
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate } from '../../src/circuit/ops.js';
import { InputError } from '../../src/core/InputError.js';
import { outcomeDistribution } from '../../src/sim/outcomeDistribution.js';
import { isTooManyBranchesError } from '../../src/sim/internal/TooManyBranchesError.js';
import { expectClose } from '../helpers/close.js';

function expectOutcomes(actual: ReadonlyMap<string, number>, expected: Record<string, number>): void {
  expect([...actual.keys()]).toEqual(Object.keys(expected).sort());
  for (const [key, p] of Object.entries(expected)) expectClose(actual.get(key)!, p, 1e-14, key);
}

describe('outcomeDistribution(circuit)', () => {
  it('Bell state measured: 00 and 11 with probability 1/2 each (Nielsen & Chuang §1.3.6)', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 2);
    b.bits('c', 2);
    b.add(gate('h', [0]), gate('cx', [0, 1])).measure(0, 0).measure(1, 1);
    expectOutcomes(outcomeDistribution(b.build()).outcomes, { '00': 0.5, '11': 0.5 });
  });

  it('concatenates registers in declaration order, first declared least significant; unmeasured bits read 0', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 2);
    b.bits('a', 1);
    const bReg = b.bits('b', 2);
    b.add(gate('x', [1])).measure(1, bReg[1]!).measure(0, 0);
    // a[0] = 0 is bit 0, b[0] (never measured) = 0 is bit 1, b[1] = 1 is bit 2: "100".
    const result = outcomeDistribution(b.build());
    expect(result.bits).toBe(3);
    expectOutcomes(result.outcomes, { '100': 1 });
  });

  it('a mid-circuit measurement decoheres: h; measure; h; measure gives four outcomes of 1/4', () => {
    // Hand computation: the first outcome is 0 or 1 with 1/2; h on the collapsed qubit gives 1/2 each.
    const b = new CircuitBuilder();
    b.qubits('q', 1);
    b.bits('c', 2);
    b.add(gate('h', [0])).measure(0, 0).add(gate('h', [0])).measure(0, 1);
    expectOutcomes(outcomeDistribution(b.build()).outcomes, { '00': 0.25, '01': 0.25, '10': 0.25, '11': 0.25 });
  });

  it('a measured qubit used as a control afterwards: ry(θ); measure q0; cx; measure q1', () => {
    // P(q0 = 1) = sin²(θ/2); cx copies it to q1, so outcomes 00 and 11 (hand computation).
    const theta = 1.1;
    const b = new CircuitBuilder();
    b.qubits('q', 2);
    b.bits('c', 2);
    b.add(gate('ry', [0], [theta])).measure(0, 0).add(gate('cx', [0, 1])).measure(1, 1);
    expectOutcomes(outcomeDistribution(b.build()).outcomes, { '00': Math.cos(theta / 2) ** 2, '11': Math.sin(theta / 2) ** 2 });
  });

  it('reset returns a qubit to |0> without recording: x; cx; reset q0; measure both gives 10', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 2);
    b.bits('c', 2);
    b.add(gate('x', [0]), gate('cx', [0, 1]), { kind: 'reset', qubit: 0 }).measure(0, 0).measure(1, 1);
    expectOutcomes(outcomeDistribution(b.build()).outcomes, { '10': 1 });
  });

  it('reset of an entangled qubit leaves the partner mixed: h; cx; reset q0; h q1; measure both', () => {
    // After the reset q0 = |0> and q1 is the mixed state I/2; h keeps I/2, so q1 reads 0 or 1 with 1/2.
    const b = new CircuitBuilder();
    b.qubits('q', 2);
    b.bits('c', 2);
    b.add(gate('h', [0]), gate('cx', [0, 1]), { kind: 'reset', qubit: 0 }, gate('h', [1])).measure(0, 0).measure(1, 1);
    expectOutcomes(outcomeDistribution(b.build()).outcomes, { '00': 0.5, '10': 0.5 });
  });

  it('a reset before any gate is a no-op and keeps the direct path exact', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 1);
    b.bits('c', 1);
    b.add({ kind: 'reset', qubit: 0 }, gate('ry', [0], [0.5])).measure(0, 0);
    expectOutcomes(outcomeDistribution(b.build()).outcomes, { '0': Math.cos(0.25) ** 2, '1': Math.sin(0.25) ** 2 });
  });

  it('refuses with an InputError suggesting shots when branches exceed maxBranches', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 1);
    b.bits('c', 3);
    for (let k = 0; k < 3; k++) b.add(gate('h', [0])).measure(0, k);
    const circuit = b.build();
    expect(() => outcomeDistribution(circuit, { maxBranches: 4 })).toThrow(InputError);
    expect(() => outcomeDistribution(circuit, { maxBranches: 4 })).toThrow(/--shots/);
    expect(outcomeDistribution(circuit, { maxBranches: 8 }).outcomes.size).toBe(8);
  });

  /** h on every qubit, then measure and reset each qubit in turn (a reset right after a measurement does not split). */
  function measureAndResetAll(qubits: number): ReturnType<CircuitBuilder['build']> {
    const b = new CircuitBuilder();
    b.qubits('q', qubits);
    b.bits('c', qubits);
    for (let q = 0; q < qubits; q++) b.add(gate('h', [q]));
    for (let q = 0; q < qubits; q++) b.measure(q, q).add({ kind: 'reset', qubit: q });
    return b.build();
  }

  function thrown(run: () => unknown): Error {
    try {
      run();
    } catch (error) {
      return error as Error;
    }
    return expect.fail('expected an error');
  }

  it('counts measure-then-reset as one split: 4 qubits give exactly 16 branches, allowed at maxBranches 16, refused at 8', () => {
    const circuit = measureAndResetAll(4);
    const outcomes = outcomeDistribution(circuit, { maxBranches: 16 }).outcomes;
    expect(outcomes.size).toBe(16);
    for (const p of outcomes.values()) expectClose(p, 1 / 16, 1e-14, 'uniform');
    expect(isTooManyBranchesError(thrown(() => outcomeDistribution(circuit, { maxBranches: 8 })))).toBe(true);
  });

  it('refuses 20 qubits with a measurement and reset on every qubit from the plan, before any branch state is copied', () => {
    // 2^20 branches of 2^20 amplitudes: the plan bound exceeds the 2^26-amplitude budget (64 states of 20 qubits).
    // A memory limit that holds only the initial state shows that no copy was attempted.
    const error = thrown(() => outcomeDistribution(measureAndResetAll(20), { memoryLimitBytes: 17 * 2 ** 20 }));
    expect(isTooManyBranchesError(error)).toBe(true);
    expect(error.message).toMatch(/2\^20 branches/);
    expect(error.message).toMatch(/--shots/);
  });

  it('caps branches by the memory limit: 16 qubits under an 8 MiB limit allow 7 states, and the message says so', () => {
    const error = thrown(() => outcomeDistribution(measureAndResetAll(16), { memoryLimitBytes: 8 * 2 ** 20 }));
    expect(error).toBeInstanceOf(InputError);
    expect(error.message).toMatch(/at most 7 measurement branches/);
    expect(error.message).toMatch(/8\.00 MiB memory limit/);
  });

  it('words the refusal in the singular for one measurement and a cap of one branch ("1 measurement or reset", "1 branch")', () => {
    const error = thrown(() => outcomeDistribution(measureAndResetAll(1), { maxBranches: 1 }));
    expect(isTooManyBranchesError(error)).toBe(true);
    expect(error.message).toMatch(/1 measurement or reset may give 2\^1 branches; the limit of 1 branch\b/);
  });

  it('a circuit without classical bits has the single empty outcome', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 1);
    b.add(gate('h', [0]));
    expectOutcomes(outcomeDistribution(b.build()).outcomes, { '': 1 });
  });
});
