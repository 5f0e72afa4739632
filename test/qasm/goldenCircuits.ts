// Hand-built circuits whose OpenQASM text is frozen in circuits/golden/: basic gates and modifiers,
// parameterised blocks with deduplication, and conjugated (compute/action/uncompute) blocks.
import { param, type Angle } from '../../src/circuit/angle.js';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { defineBlock, defineConjugatedBlock } from '../../src/circuit/defineBlock.js';
import { call, gate } from '../../src/circuit/ops.js';
import type { Circuit } from '../../src/circuit/types.js';

/** Standard gates with every modifier, awkward numbers, measurement, reset and barrier. */
export function basicsCircuit(): Circuit {
  const b = new CircuitBuilder();
  const q = b.qubits('q', 3);
  const c = b.bits('c', 2);
  b.add(
    gate('h', [q[0]!]),
    gate('cx', [q[0]!, q[1]!]),
    gate('rz', [q[2]!], [-0]),
    gate('rx', [q[1]!], [1e-7]),
    gate('ry', [q[0]!], [-2.5e21]),
    gate('U', [q[2]!], [Math.PI / 2, -0.25, 5e-324]),
    gate('x', [q[2]!], [], { controls: [q[0]!, q[1]!] }),
    gate('s', [q[1]!], [], { negControls: [q[0]!], inverse: true }),
    gate('sx', [q[0]!], [], { power: 0.5 }),
    gate('t', [q[1]!], [], { inverse: true, power: -3 }),
    gate('gphase', [], [0.125]),
    gate('gphase', [], [-1.5], { controls: [q[2]!] }),
    { kind: 'barrier', qubits: [q[0]!, q[1]!] },
    { kind: 'measure', qubit: q[0]!, bit: c[0]! },
    { kind: 'measure', qubit: q[1]!, bit: c[1]! },
    { kind: 'reset', qubit: q[0]! },
    { kind: 'barrier', qubits: [] },
  );
  return b.build();
}

/** Parameterised blocks: expressions, reuse by identity, a same-content copy, and a same-name clash. */
export function blocksCircuit(): Circuit {
  const theta = param(0);
  const phi = param(1);
  const expression: Angle = { op: 'add', left: { op: 'mul', left: theta, right: 2 }, right: -0.5 };
  const rotate = defineBlock({ name: 'rotate', role: 'two-axis rotation', qubits: 1, params: ['theta', 'phi'] }, [
    gate('rz', [0], [expression]),
    gate('ry', [0], [{ op: 'neg', arg: theta }]),
    gate('rx', [0], [{ op: 'pow', left: phi, right: { op: 'neg', arg: theta } }]),
    gate('p', [0], [{ op: 'sub', left: phi, right: { op: 'sub', left: theta, right: { op: 'call', fn: 'sin', arg: phi } } }]),
  ]);
  const copy = { ...rotate };
  const otherRotate = defineBlock({ name: 'rotate', role: 'a different block with the same name', qubits: 1 }, [gate('h', [0])]);
  const entangle = defineBlock({ name: 'entangle', role: 'rotate both, then entangle', qubits: 2, params: ['a'] }, [
    call(rotate, [0], [param(0), 0.5]),
    call(copy, [1], [{ op: 'div', left: param(0), right: 3 }, 1.5]),
    gate('cz', [0, 1]),
  ]);
  const b = new CircuitBuilder();
  const q = b.qubits('q', 2);
  b.add(
    call(entangle, [q[0]!, q[1]!], [0.75]),
    call(rotate, [q[1]!], [-0.1, 2], { inverse: true, power: 2 }),
    call(otherRotate, [q[0]!], [], { controls: [q[1]!] }),
  );
  return b.build();
}

/** A conjugated block called plainly, inverted, controlled and repeated, and inside a controlled plain block. */
export function conjugatedCircuit(): Circuit {
  const kick = defineConjugatedBlock(
    { name: 'phase_kick', role: 'basis change, phase, basis change back', qubits: 2, params: ['theta'] },
    [gate('h', [0]), gate('cx', [0, 1])],
    [gate('rz', [1], [param(0)])],
  );
  const wrapper = defineBlock({ name: 'wrapper', role: 'a kick between two T gates', qubits: 2 }, [
    gate('t', [0]),
    call(kick, [0, 1], [0.3]),
    gate('t', [1]),
  ]);
  const b = new CircuitBuilder();
  const anc = b.qubits('anc', 1);
  const sys = b.qubits('sys', 2);
  b.add(
    call(kick, [sys[0]!, sys[1]!], [0.5]),
    call(kick, [sys[0]!, sys[1]!], [0.5], { inverse: true }),
    call(kick, [sys[0]!, sys[1]!], [0.5], { controls: [anc[0]!] }),
    call(kick, [sys[1]!, sys[0]!], [-0.25], { negControls: [anc[0]!], power: 3 }),
    call(wrapper, [sys[0]!, sys[1]!], [], { controls: [anc[0]!], inverse: true }),
  );
  return b.build();
}

export const GOLDEN_CIRCUITS: Readonly<Record<string, () => Circuit>> = {
  basics: basicsCircuit,
  blocks: blocksCircuit,
  conjugated: conjugatedCircuit,
};
