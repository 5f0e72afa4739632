// registerOutcomes: splits outcome keys (bit g at position bits − 1 − g) into register strings written bit 0 first, and
// sorts by value (descending), equal values by the register strings in declaration order.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { registerOutcomes } from '../../src/sim/registerOutcomes.js';

const registers = [
  { name: 'a', size: 1, offset: 0 },
  { name: 'b', size: 2, offset: 1 },
];

describe('registerOutcomes(distribution, registers)', () => {
  it('reads bit g of the key as character k = g − offset of its register', () => {
    // Key "101": bit 0 = 1 (a[0]), bit 1 = 0 (b[0]), bit 2 = 1 (b[1]).
    const distribution = { qubits: 2, bits: 3, outcomes: new Map([['101', 0.25], ['110', 0.75]]) };
    expect(registerOutcomes(distribution, registers)).toEqual([
      { bits: { a: '0', b: '11' }, value: 0.75 },
      { bits: { a: '1', b: '01' }, value: 0.25 },
    ]);
  });

  it('orders equal values by the register strings, first register first', () => {
    const distribution = { qubits: 3, bits: 3, outcomes: new Map([['000', 2], ['001', 2], ['010', 2], ['100', 5]]) };
    expect(registerOutcomes(distribution, registers).map((o) => `${o.bits.a}|${o.bits.b}`)).toEqual(['0|01', '0|00', '0|10', '1|00']);
  });

  it('keeps every outcome once, values non-increasing, and rebuilds each key from its register strings', () => {
    const keys = fc.uniqueArray(fc.stringMatching(/^[01]{3}$/), { minLength: 1, maxLength: 8 });
    fc.assert(
      fc.property(keys, fc.array(fc.integer({ min: 1, max: 4 }), { minLength: 8, maxLength: 8 }), (chosen, values) => {
        const outcomes = new Map(chosen.map((key, k) => [key, values[k]!]));
        const rows = registerOutcomes({ qubits: 3, bits: 3, outcomes }, registers);
        expect(rows).toHaveLength(chosen.length);
        for (let k = 1; k < rows.length; k++) expect(rows[k]!.value).toBeLessThanOrEqual(rows[k - 1]!.value);
        for (const row of rows) {
          const key = [...row.bits.a! + row.bits.b!].reverse().join('');
          expect(outcomes.get(key)).toBe(row.value);
        }
      }),
    );
  });

  it('refuses a register reaching past the outcome bits (RangeError)', () => {
    expect(() => registerOutcomes({ qubits: 1, bits: 2, outcomes: new Map([['00', 1]]) }, registers)).toThrow(RangeError);
  });
});
