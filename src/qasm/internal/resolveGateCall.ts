// Resolves one parsed gate call into IR operations: looks the gate up, evaluates its arguments,
// reduces the modifier chain to controls / negControls / inverse / power, and broadcasts over registers.
import type { Angle } from '../../circuit/angle.js';
import { MAX_GATE_POWER } from '../../circuit/resolveGate.js';
import type { StandardGate } from '../../circuit/standardGates.js';
import type { Block, UnitaryOp } from '../../circuit/types.js';
import { constantValue, expressionToAngle, integerValue } from './expressionToAngle.js';
import type { GateCall, Identifier, Modifier, Operand } from './syntax.js';
import { fail } from './problem.js';

/** Largest control count a `ctrl(n) @` / `negctrl(n) @` modifier may name. */
const MAX_CONTROLS = 1 << 16;

export type GateTarget = { readonly kind: 'standard'; readonly gate: StandardGate } | { readonly kind: 'block'; readonly block: Block };

/** What a gate call can see: parameters, gates and qubit operands of its scope. */
export interface CallScope {
  readonly params: ReadonlyMap<string, number>;
  /** The gate named `name`; fails when there is none. */
  gate(name: Identifier): GateTarget;
  /** The qubits an operand denotes: one qubit, or all qubits of a register (broadcast). */
  operand(operand: Operand): readonly number[];
}

interface ControlGroup {
  readonly positive: boolean;
  readonly count: number;
}

function plural(n: number, word: string): string {
  return `${n} ${word}${n === 1 ? '' : 's'}`;
}

/** Powers and inverses from the innermost modifier outwards; the IR means inv @ pow(power) @ g. */
function reduceExponent(call: GateCall, target: GateTarget, scope: CallScope): { inverse: boolean; power: number } {
  const modifiers = call.modifiers;
  let inverse = false;
  let power = 1;
  for (let k = modifiers.length - 1; k >= 0; k--) {
    const m = modifiers[k] as Modifier;
    if (m.kind === 'inv') inverse = !inverse;
    if (m.kind !== 'pow') continue;
    const exponent = constantValue(m.exponent, 'the exponent of pow', scope.params);
    if (!(Math.abs(exponent) <= MAX_GATE_POWER)) {
      fail(m.exponent.position, 'an exponent of magnitude at most 2^53', `the exponent of pow must have magnitude at most 2^53, got ${exponent}`);
    }
    if (Number.isInteger(exponent)) {
      // An integer power of any matrix power is exact: (g^p)^k = g^(pk).
      power *= exponent;
    } else if (target.kind === 'block') {
      fail(m.position, 'an integer exponent for a user-defined gate', `pow of user-defined gate '${target.block.name}' must be an integer, got ${exponent}`);
    } else if (power === 1 && !inverse) {
      power = exponent;
    } else if (target.gate.selfInverse && Math.abs(power) === 1) {
      // A self-inverse gate to the power ±1 is the gate itself.
      inverse = false;
      power = exponent;
    } else {
      // The principal power of an inverted or already powered gate differs on the branch cut.
      const rewrite = `inv @ pow(${exponent}) @ ${target.gate.name}`;
      fail(
        m.position,
        `'${rewrite}' (non-integer pow innermost)`,
        `a non-integer pow(${exponent}) cannot be applied over inv or another pow of '${target.gate.name}'; write '${rewrite}' instead`,
      );
    }
  }
  if (!(Math.abs(power) <= MAX_GATE_POWER)) {
    fail(call.position, 'a combined power of magnitude at most 2^53', `the combined power of the pow modifiers must have magnitude at most 2^53, got ${power}`);
  }
  return { inverse, power };
}

function controlGroups(modifiers: readonly Modifier[], scope: CallScope): ControlGroup[] {
  const groups: ControlGroup[] = [];
  for (const m of modifiers) {
    if (m.kind !== 'ctrl' && m.kind !== 'negctrl') continue;
    const count = m.count === null ? 1 : integerValue(m.count, `the control count of ${m.kind}`, 1, MAX_CONTROLS, scope.params);
    groups.push({ positive: m.kind === 'ctrl', count });
  }
  return groups;
}

function angles(call: GateCall, expected: number, name: string, scope: CallScope): Angle[] {
  if (call.args.length !== expected) {
    fail(call.gate.position, `${plural(expected, 'parameter')} for '${name}'`, `gate '${name}' takes ${plural(expected, 'parameter')}, got ${call.args.length}`);
  }
  return call.args.map((arg) => {
    const angle = expressionToAngle(arg, scope.params);
    if (typeof angle === 'number' && !Number.isFinite(angle)) fail(arg.position, 'a finite angle', `expected a finite angle, got ${angle}`);
    return angle;
  });
}

/** Operand qubit lists for each broadcast instance (one instance when nothing is a register). */
function broadcast(call: GateCall, scope: CallScope): number[][] {
  const lists = call.operands.map((o) => scope.operand(o));
  let length = 1;
  lists.forEach((list, k) => {
    if (list.length === 1) return;
    if (length !== 1 && list.length !== length) {
      fail((call.operands[k] as Operand).position, `a register of size ${length} to match the other operands`, `cannot broadcast over registers of sizes ${length} and ${list.length}`);
    }
    length = list.length;
  });
  const instances: number[][] = [];
  for (let i = 0; i < length; i++) {
    const qubits = lists.map((list) => (list.length === 1 ? list[0] : list[i]) as number);
    const seen = new Set<number>();
    qubits.forEach((q, k) => {
      if (seen.has(q)) fail((call.operands[k] as Operand).position, 'distinct qubit operands', `repeated qubit operand '${(call.operands[k] as Operand).name}' in a call of '${call.gate.name}'`);
      seen.add(q);
    });
    instances.push(qubits);
  }
  return instances;
}

/** The IR operations of `call` (several when it broadcasts over registers). */
export function resolveGateCall(call: GateCall, scope: CallScope): UnitaryOp[] {
  const target = scope.gate(call.gate);
  const name = call.gate.name;
  const params = angles(call, target.kind === 'standard' ? target.gate.params : target.block.params.length, name, scope);
  const groups = controlGroups(call.modifiers, scope);
  const { inverse, power } = reduceExponent(call, target, scope);
  const controlCount = groups.reduce((sum, g) => sum + g.count, 0);
  const expected = controlCount + (target.kind === 'standard' ? target.gate.qubits : target.block.qubits);
  if (call.operands.length !== expected) {
    const what = controlCount > 0 ? `gate '${name}' with its controls` : `gate '${name}'`;
    fail(call.gate.position, `${plural(expected, 'qubit operand')} for ${what}`, `${what} takes ${plural(expected, 'qubit')}, got ${call.operands.length}`);
  }
  return broadcast(call, scope).map((qubits) => {
    const controls: number[] = [];
    const negControls: number[] = [];
    let next = 0;
    for (const group of groups) {
      const taken = qubits.slice(next, next + group.count);
      (group.positive ? controls : negControls).push(...taken);
      next += group.count;
    }
    const operands = qubits.slice(next);
    const modifiers = { controls, negControls, inverse, power };
    return target.kind === 'standard'
      ? { kind: 'gate', name: target.gate.name, params, qubits: operands, ...modifiers }
      : { kind: 'call', block: target.block, args: params, qubits: operands, ...modifiers };
  });
}
