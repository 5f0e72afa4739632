// circuitMatrix(circuit): unitary columns for a small circuit; refusal above 12 qubits and of measurements.
import { describe, expect, it } from 'vitest';
import { CircuitBuilder } from '../../src/circuit/CircuitBuilder.js';
import { gate } from '../../src/circuit/ops.js';
import { InputError } from '../../src/core/InputError.js';
import { circuitMatrix } from '../../src/sim/circuitMatrix.js';
import { expectClose } from '../helpers/close.js';

describe('circuitMatrix(circuit)', () => {
  it('is unitary: U†U = I for a 3-qubit circuit with modifiers', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 3);
    b.add(gate('h', [0]), gate('cu', [0, 2], [0.3, 0.2, -1, 0.5]), gate('ry', [1], [0.4], { negControls: [2], power: 0.5 }), gate('cswap', [1, 0, 2]));
    const { re, im, dim } = circuitMatrix(b.build());
    for (let i = 0; i < dim; i++) {
      for (let j = 0; j < dim; j++) {
        let sr = 0;
        let si = 0;
        for (let k = 0; k < dim; k++) {
          sr += re[k * dim + i]! * re[k * dim + j]! + im[k * dim + i]! * im[k * dim + j]!;
          si += re[k * dim + i]! * im[k * dim + j]! - im[k * dim + i]! * re[k * dim + j]!;
        }
        expectClose(sr, i === j ? 1 : 0, 1e-14, `re(U†U)[${i},${j}]`);
        expectClose(si, 0, 1e-14, `im(U†U)[${i},${j}]`);
      }
    }
  });

  it('puts <i|U|j> at row i, column j: x on qubit 0 of 2 maps |0> to |1>', () => {
    const b = new CircuitBuilder();
    b.qubits('q', 2);
    b.add(gate('x', [0]));
    const { re, dim } = circuitMatrix(b.build());
    expect(dim).toBe(4);
    expect(re[1 * dim + 0]).toBe(1);
    expect(re[0 * dim + 1]).toBe(1);
    expect(re[0]).toBe(0);
  });

  it('refuses more than 12 qubits and circuits with measurements, with InputErrors', () => {
    const big = new CircuitBuilder();
    big.qubits('q', 13);
    expect(() => circuitMatrix(big.build())).toThrow(/13 qubits exceed the limit of 12/);
    const measured = new CircuitBuilder();
    measured.qubits('q', 1);
    measured.bits('c', 1);
    measured.measure(0, 0);
    expect(() => circuitMatrix(measured.build())).toThrow(InputError);
  });
});
