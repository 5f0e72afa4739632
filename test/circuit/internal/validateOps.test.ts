// validateUnitaryOp: an op is rejected exactly when an operand is out of range or occurs twice across its controls, negative
// controls and targets (the definition, checked here with a Set), whatever ops were checked before.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gate } from '../../../src/circuit/ops.js';
import { validateUnitaryOp } from '../../../src/circuit/internal/validateOps.js';

describe('validateUnitaryOp(op, qubitCount, …)', () => {
  it('rejects a repeated operand and accepts distinct ones, over a sequence of checks', () => {
    const opArb = fc.record({
      controls: fc.array(fc.integer({ min: 0, max: 11 }), { maxLength: 6 }),
      negControls: fc.array(fc.integer({ min: 0, max: 11 }), { maxLength: 6 }),
      target: fc.integer({ min: 0, max: 11 }),
    });
    fc.assert(
      fc.property(fc.array(opArb, { minLength: 1, maxLength: 20 }), fc.integer({ min: 12, max: 40 }), (ops, qubitCount) => {
        for (const { controls, negControls, target } of ops) {
          const op = gate('x', [target], [], { controls, negControls });
          const all = [...controls, ...negControls, target];
          const check = (): void => validateUnitaryOp(op, qubitCount, 0, 'test');
          if (new Set(all).size !== all.length) expect(check).toThrow(/repeated qubit operand/);
          else expect(check).not.toThrow();
        }
      }),
      { numRuns: 200 },
    );
  });

  it('names the operands of a repeat and rejects an operand out of range', () => {
    expect(() => validateUnitaryOp(gate('cx', [2, 5], [], { controls: [5] }), 8, 0, 'here')).toThrow('here: repeated qubit operand in [5,2,5]');
    expect(() => validateUnitaryOp(gate('x', [8]), 8, 0, 'here')).toThrow(/qubit 8 out of range 0..7/);
  });

  it('checks wide scopes (beyond the stamped range) the same way', () => {
    const wide = 2 ** 21;
    expect(() => validateUnitaryOp(gate('x', [wide - 1], [], { controls: [wide - 1] }), wide, 0, 'wide')).toThrow(/repeated/);
    expect(() => validateUnitaryOp(gate('x', [wide - 1], [], { controls: [0] }), wide, 0, 'wide')).not.toThrow();
  });
});
