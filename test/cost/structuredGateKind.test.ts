// structuredGateKind: each kind has the fields its definition gives (built-in controls added, the display string of
// gateKind, the Clifford levels of the effective angle and its half), equal inputs give the same (memoised) object, inverting
// flips only the inverse flag, and kindKey is the display string with the two levels.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gateKind } from '../../src/circuit/gateKind.js';
import { angleLevel } from '../../src/cost/internal/angleLevel.js';
import { invertedKind, kindKey, structuredGateKind, type GateFamily } from '../../src/cost/structuredGateKind.js';

/** Built-in controls, family and effective angle of a few gates, at odd integer powers (from the gate definitions). */
const GATES: Record<string, { builtIn: number; family: GateFamily; angle: (theta: number, power: number) => number | null }> = {
  ry: { builtIn: 0, family: 'rotation', angle: (theta, power) => theta * power },
  crz: { builtIn: 1, family: 'rotation', angle: (theta, power) => theta * power },
  p: { builtIn: 0, family: 'phase', angle: (theta, power) => theta * power },
  x: { builtIn: 0, family: 'pauli', angle: () => null },
  ccx: { builtIn: 2, family: 'pauli', angle: () => null },
  h: { builtIn: 0, family: 'hadamard', angle: () => null },
};

const inputArb = fc.record({
  name: fc.constantFrom(...Object.keys(GATES)),
  theta: fc.oneof(fc.integer({ min: -16, max: 16 }).map((k) => (k * Math.PI) / 4), fc.double({ min: -7, max: 7, noNaN: true })),
  controls: fc.integer({ min: 0, max: 20 }),
  negControls: fc.integer({ min: 0, max: 20 }),
  inverse: fc.boolean(),
  power: fc.constantFrom(1, -1, 3),
});

describe('structuredGateKind(name, params, …)', () => {
  it('has the fields of its definition, and returns the same object for equal inputs', () => {
    fc.assert(
      fc.property(inputArb, ({ name, theta, controls, negControls, inverse, power }) => {
        const gate = GATES[name]!;
        const params = gate.angle(1, 1) === null ? [] : [theta];
        const kind = structuredGateKind(name, params, controls, negControls, inverse, power);
        const angle = gate.angle(theta, power);
        expect(kind).toEqual({
          name,
          controls: gate.builtIn + controls,
          negControls,
          inverse,
          power,
          family: gate.family,
          angle: angleLevel(angle),
          halfAngle: angleLevel(angle === null ? null : angle / 2),
          display: gateKind(name, controls, negControls, inverse, power),
        });
        expect(structuredGateKind(name, [...params], controls, negControls, inverse, power)).toBe(kind);
        expect(kindKey(kind)).toBe(`${kind.display}|${kind.angle}${kind.halfAngle}`);
        expect(kindKey({ ...kind })).toBe(kindKey(kind));
      }),
      { numRuns: 300 },
    );
  });

  it('keeps kinds that differ only in an angle level apart', () => {
    const clifford = structuredGateKind('rz', [Math.PI / 2], 1, 0, false, 1);
    const arbitrary = structuredGateKind('rz', [0.3], 1, 0, false, 1);
    expect(arbitrary).not.toBe(clifford);
    expect(kindKey(arbitrary)).not.toBe(kindKey(clifford));
    expect(structuredGateKind('rz', [0.7], 1, 0, false, 1)).toBe(arbitrary);
  });
});

describe('invertedKind(kind)', () => {
  it('is the kind of the same gate with the inverse flag flipped', () => {
    fc.assert(
      fc.property(inputArb, ({ name, theta, controls, negControls, inverse, power }) => {
        const params = GATES[name]!.angle(1, 1) === null ? [] : [theta];
        const kind = structuredGateKind(name, params, controls, negControls, inverse, power);
        expect(invertedKind(kind)).toBe(structuredGateKind(name, params, controls, negControls, !inverse, power));
        expect(invertedKind(invertedKind(kind))).toBe(kind);
      }),
      { numRuns: 200 },
    );
  });
});
