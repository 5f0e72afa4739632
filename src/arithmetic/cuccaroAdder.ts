// cuccaroAdder: the in-place ripple-carry adder b ← a + b + c0 of Cuccaro, Draper, Kutin & Moulton
// (arXiv:quant-ph/0410184, 2004) from MAJ and UMA gates with one carry qubit, optionally with a carry-out qubit.
import { defineBlock } from '../circuit/defineBlock.js';
import { gate } from '../circuit/ops.js';
import type { Block, GateOp } from '../circuit/types.js';

export interface CuccaroOptions {
  /** Add a carry-out qubit z ^= carry (2·width − 1 Toffolis); default false: modulo 2^width (2·width − 2 Toffolis). */
  readonly carryOut?: boolean;
}

const maj = (c: number, b: number, a: number): GateOp[] => [gate('cx', [a, b]), gate('cx', [a, c]), gate('ccx', [c, b, a])];
const uma = (c: number, b: number, a: number): GateOp[] => [gate('ccx', [c, b, a]), gate('cx', [a, c]), gate('cx', [c, b])];

/**
 * Block on qubits [a_0 … a_{w−1}, b_0 … b_{w−1}, c0 (, z)]: b ← a + b + c0 mod 2^w, a and c0 restored, and with
 * `carryOut` z ^= the carry out of the top bit. MAJ on bits 0 … w−2 (bit i's carry kept in a_{i−1}, in c0 for i = 0),
 * the top bit by CNOTs (plus one Toffoli into z: z ^= a ⊕ (a⊕b)(a⊕c) = MAJ(a, b, c)), then UMA (the 2-CNOT form)
 * back down (Cuccaro et al. 2004, Figs. 2–4).
 * @throws RangeError when width is not a positive integer.
 */
export function cuccaroAdder(width: number, options: CuccaroOptions = {}): Block {
  if (!Number.isInteger(width) || width < 1) throw new RangeError(`cuccaroAdder: width ${width} is not a positive integer`);
  const carryOut = options.carryOut ?? false;
  const a = (i: number): number => i;
  const b = (i: number): number => width + i;
  const c0 = 2 * width;
  const carrySlot = (i: number): number => (i === 0 ? c0 : a(i - 1));
  const top = width - 1;
  const ops: GateOp[] = [];
  for (let i = 0; i < top; i++) ops.push(...maj(carrySlot(i), b(i), a(i)));
  if (carryOut) {
    const z = 2 * width + 1;
    ops.push(
      gate('cx', [a(top), b(top)]),
      gate('cx', [a(top), carrySlot(top)]),
      gate('ccx', [carrySlot(top), b(top), z]),
      gate('cx', [a(top), z]),
      gate('cx', [a(top), carrySlot(top)]),
      gate('cx', [carrySlot(top), b(top)]),
    );
  } else {
    ops.push(gate('cx', [a(top), b(top)]), gate('cx', [carrySlot(top), b(top)]));
  }
  for (let i = top - 1; i >= 0; i--) ops.push(...uma(carrySlot(i), b(i), a(i)));
  return defineBlock(
    {
      name: carryOut ? `cuccaro_adder_carry_${width}` : `cuccaro_adder_${width}`,
      role: `ripple-carry adder b <- a + b + c0 on ${width} bits${carryOut ? ' with carry out' : ' modulo 2^width'}`,
      qubits: 2 * width + 1 + (carryOut ? 1 : 0),
    },
    ops,
  );
}
