// StateVector: construction, copies, norm, and refusal of states that do not fit the memory limit.
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/core/InputError.js';
import { StateVector, stateVectorBytes } from '../../src/sim/StateVector.js';

describe('StateVector', () => {
  it('zero(n) is |0…0> and basis(n, k) is |k>', () => {
    const zero = StateVector.zero(3);
    expect([...zero.re]).toEqual([1, 0, 0, 0, 0, 0, 0, 0]);
    expect([...zero.im]).toEqual(new Array(8).fill(0));
    const basis = StateVector.basis(3, 5);
    expect(basis.re.indexOf(1)).toBe(5);
    expect(basis.norm()).toBe(1);
  });

  it('fromAmplitudes copies its input, clone() is independent, norm() is the 2-norm', () => {
    const re = [0.6, 0];
    const state = StateVector.fromAmplitudes(re, [0, 0.8]);
    re[0] = 9;
    expect(state.qubits).toBe(1);
    expect(state.re[0]).toBe(0.6);
    expect(state.norm()).toBeCloseTo(1, 15);
    const copy = state.clone();
    copy.re[0] = 0;
    expect(state.re[0]).toBe(0.6);
  });

  it('fromAmplitudes refuses lengths that are not powers of two', () => {
    expect(() => StateVector.fromAmplitudes([1, 0, 0], [0, 0, 0])).toThrow(RangeError);
  });

  it('zero(n) refuses with an InputError naming the need when 16·2^n bytes exceed the limit', () => {
    expect(stateVectorBytes(20)).toBeGreaterThanOrEqual(16 * 2 ** 20);
    expect(() => StateVector.zero(20, { memoryLimitBytes: 16 * 2 ** 20 - 1 })).toThrow(InputError);
    expect(() => StateVector.zero(20, { memoryLimitBytes: 1e6 })).toThrow(/20-qubit state vector needs 16\.00 MiB/);
    expect(StateVector.zero(10, { memoryLimitBytes: 1e6 }).re.length).toBe(1024);
  });

  it('refuses more than 30 qubits before allocating anything', () => {
    expect(() => StateVector.zero(31, { memoryLimitBytes: 1e15 })).toThrow(/maximum of 30/);
  });

  it('lets 30 qubits (16 GiB) fit a 24 GiB budget and follows POLEWRIGHT_MEMORY_LIMIT before allocating', () => {
    expect(stateVectorBytes(30)).toBeLessThan(24 * 2 ** 30);
    expect(() => StateVector.zero(30, { memoryLimitBytes: 16 * 2 ** 30 - 1 })).toThrow(/30-qubit state vector needs 16\.00 GiB/);
    const saved = process.env.POLEWRIGHT_MEMORY_LIMIT;
    process.env.POLEWRIGHT_MEMORY_LIMIT = String(2 ** 20);
    try {
      expect(() => StateVector.zero(16)).toThrow(InputError);
      expect(() => StateVector.zero(30)).toThrow(/30-qubit state vector needs 16\.00 GiB/);
      expect(StateVector.zero(12).re.length).toBe(4096);
    } finally {
      if (saved === undefined) delete process.env.POLEWRIGHT_MEMORY_LIMIT;
      else process.env.POLEWRIGHT_MEMORY_LIMIT = saved;
    }
  });
});
